import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

/** A large tick box with its words; the state shows as a mark, not colour alone. */
export function CheckboxRow({ label, checked, onChange, testID }: { label: string; checked: boolean; onChange: (v: boolean) => void; testID?: string }) {
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityState={{ checked }}
      accessibilityLabel={label}
      onPress={() => onChange(!checked)}
      testID={testID}
      style={({ pressed }) => [styles.row, checked && styles.on, pressed && styles.pressed]}
    >
      <Text style={[styles.box, checked && styles.boxOn]} aria-hidden>
        {checked ? '✓' : ' '}
      </Text>
      <Text style={styles.label}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: touchTarget, flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  on: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { opacity: 0.85 },
  box: { width: 28, height: 28, lineHeight: 24, textAlign: 'center', borderWidth: 2, borderColor: colors.inkMuted, borderRadius: radius.sm, fontFamily: fonts.bold, fontSize: 18, color: colors.onAccent },
  boxOn: { backgroundColor: colors.accent, borderColor: colors.accent },
  label: { ...type.body, flex: 1, color: colors.ink },
});
