import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, fonts, radius, space, touchTarget } from '@/components/theme';

interface Props<T extends string> {
  label: string;
  value: T;
  options: readonly T[];
  onChange: (value: T) => void;
  testID?: string;
}

/** A compact unit picker beside a number field: shows the unit, opens the choices in place. */
export function UnitSelect<T extends string>({ label, value, options, onChange, testID }: Props<T>) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.wrap}>
      <Pressable
        accessibilityRole="button"
        accessibilityLabel={`${label}: ${value}. Change unit`}
        accessibilityState={{ expanded: open }}
        onPress={() => setOpen((o) => !o)}
        style={({ pressed }) => [styles.button, pressed && styles.pressed]}
        testID={testID}
      >
        <Text style={styles.buttonText}>
          {value} {open ? '▴' : '▾'}
        </Text>
      </Pressable>
      {open ? (
        <View style={styles.list} accessibilityRole="radiogroup" accessibilityLabel={label}>
          {options.map((o) => (
            <Pressable
              key={o}
              accessibilityRole="radio"
              aria-checked={o === value}
              accessibilityLabel={o}
              testID={testID ? `${testID}-${o}` : undefined}
              onPress={() => {
                onChange(o);
                setOpen(false);
              }}
              style={({ pressed }) => [styles.option, o === value && styles.picked, pressed && styles.pressed]}
            >
              <Text style={[styles.optionText, o === value && styles.pickedText]}>{o === value ? `✓ ${o}` : o}</Text>
            </Pressable>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  button: {
    minHeight: touchTarget,
    minWidth: 84,
    paddingHorizontal: space.md,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.accent,
    backgroundColor: colors.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  buttonText: { fontFamily: fonts.bold, fontSize: 16, color: colors.accentDark },
  list: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, maxWidth: 260 },
  option: { minHeight: touchTarget, minWidth: touchTarget, paddingHorizontal: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface, alignItems: 'center', justifyContent: 'center' },
  picked: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { opacity: 0.85 },
  optionText: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  pickedText: { fontFamily: fonts.bold, color: colors.accentDark },
});
