import { Pressable, ScrollView, StyleSheet, Text } from 'react-native';
import { INSTALL_TYPES, INSTALL_TYPE_LABELS, type InstallType } from '@/trees/tree-format';
import { colors, fonts, radius, space, touchTarget } from '@/components/theme';

/** Filter chips for the install that was done; "Any install" clears the filter. The picked chip carries a tick. */
export function InstallTypeChips({ value, onChange }: { value: InstallType | undefined; onChange: (v: InstallType | undefined) => void }) {
  const chips: Array<{ key: string; label: string; value: InstallType | undefined }> = [
    { key: 'any', label: 'Any install', value: undefined },
    ...INSTALL_TYPES.map((t) => ({ key: t, label: INSTALL_TYPE_LABELS[t], value: t })),
  ];
  return (
    <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} accessibilityLabel="Install type" testID="install-chips">
      {chips.map((c) => {
        const picked = c.value === value;
        return (
          <Pressable
            key={c.key}
            role="checkbox"
            aria-checked={picked}
            accessibilityLabel={c.label}
            testID={`install-chip-${c.key}`}
            onPress={() => onChange(c.value)}
            style={({ pressed }) => [styles.chip, picked && styles.picked, pressed && styles.pressed]}
          >
            <Text style={[styles.text, picked && styles.pickedText]}>
              {picked ? '✓ ' : ''}
              {c.label}
            </Text>
          </Pressable>
        );
      })}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.xs },
  chip: {
    minHeight: touchTarget,
    justifyContent: 'center',
    paddingHorizontal: space.lg,
    borderRadius: radius.lg,
    borderWidth: 2,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  picked: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { opacity: 0.85 },
  text: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  pickedText: { color: colors.accentDark },
});
