import { forwardRef, useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';

export interface TextFieldProps extends Omit<TextInputProps, 'style'> {
  label: string;
  /** A message shown under the field, with an icon; marks the field invalid. */
  error?: string;
  /** A short help line under the label. */
  hint?: string;
  testID?: string;
}

/** A labelled text input with its own error line (large, readable, 48 px tall). */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField({ label, error, hint, testID, ...input }, ref) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      {hint ? <Text style={styles.hint}>{hint}</Text> : null}
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        aria-invalid={!!error}
        placeholderTextColor={colors.inkMuted}
        testID={testID}
        {...input}
        onFocus={(e) => {
          setFocused(true);
          input.onFocus?.(e);
        }}
        onBlur={(e) => {
          setFocused(false);
          input.onBlur?.(e);
        }}
        style={[styles.input, input.multiline && styles.multiline, focused && styles.focused, !!error && styles.invalid]}
      />
      {error ? (
        <Text style={styles.error} testID={testID ? `${testID}-error` : undefined} accessibilityLiveRegion="polite">
          ✖ {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  input: {
    minHeight: touchTarget,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    fontFamily: fonts.regular,
    fontSize: 17,
    color: colors.ink,
  },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
  focused: { borderColor: colors.accent },
  invalid: { borderColor: colors.danger },
  error: { ...type.small, fontFamily: fonts.semibold, color: colors.danger },
});
