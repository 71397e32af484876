import { ActivityIndicator, Pressable, StyleSheet, Text } from 'react-native';
import { colors, fonts, radius, space, touchTarget } from './theme';

interface Props {
  label: string;
  onPress: () => void;
  kind?: 'primary' | 'secondary' | 'danger';
  busy?: boolean;
  disabled?: boolean;
  testID?: string;
}

/** A large, clearly labelled button (48 px or more tall). */
export function Button({ label, onPress, kind = 'primary', busy, disabled, testID }: Props) {
  const off = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: !!off, busy: !!busy }}
      onPress={off ? undefined : onPress}
      testID={testID}
      style={({ pressed }) => [styles.base, styles[kind], pressed && styles.pressed, off && styles.off]}
    >
      {busy ? <ActivityIndicator color={kind === 'secondary' ? colors.accent : colors.onAccent} /> : null}
      <Text style={[styles.text, kind === 'secondary' ? styles.textSecondary : null]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: touchTarget,
    paddingHorizontal: space.xl,
    borderRadius: radius.md,
    alignItems: 'center',
    justifyContent: 'center',
    flexDirection: 'row',
    gap: space.sm,
  },
  primary: { backgroundColor: colors.accent },
  secondary: { backgroundColor: colors.surface, borderWidth: 2, borderColor: colors.accent },
  danger: { backgroundColor: colors.danger },
  pressed: { opacity: 0.85 },
  off: { opacity: 0.5 },
  text: { fontFamily: fonts.bold, fontSize: 17, color: colors.onAccent },
  textSecondary: { color: colors.accentDark },
});
