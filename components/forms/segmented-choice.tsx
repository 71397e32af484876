import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

export interface Choice<T extends string> {
  value: T;
  label: string;
}

interface Props<T extends string> {
  label: string;
  options: readonly Choice<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
  error?: string;
  hint?: string;
  testID?: string;
}

/**
 * One choice out of a few, as a row of large buttons (wraps on a phone).
 * The picked one carries a tick as well as the colour.
 */
export function SegmentedChoice<T extends string>({ label, options, value, onChange, error, hint, testID }: Props<T>) {
  return (
    <View style={styles.wrap} testID={testID}>
      <Text style={styles.label} nativeID={testID ? `${testID}-label` : undefined}>
        {label}
      </Text>
      {hint ? <Text style={styles.hint}>{hint}</Text> : null}
      <View style={styles.row} accessibilityRole="radiogroup" accessibilityLabel={label}>
        {options.map((o) => {
          const picked = o.value === value;
          return (
            <Pressable
              key={o.value}
              accessibilityRole="radio"
              aria-checked={picked}
              accessibilityLabel={o.label}
              testID={testID ? `${testID}-${o.value}` : undefined}
              onPress={() => onChange(o.value)}
              style={({ pressed }) => [styles.option, picked && styles.picked, pressed && styles.pressed]}
            >
              <Text style={[styles.optionText, picked && styles.pickedText]}>
                {picked ? '✓ ' : ''}
                {o.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {error ? (
        <Text style={styles.error} testID={testID ? `${testID}-error` : undefined}>
          ✖ {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  option: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  picked: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { opacity: 0.85 },
  optionText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  pickedText: { color: colors.accentDark, fontFamily: fonts.bold },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
});
