import { TextField, type TextFieldProps } from './text-field';

/** An e-mail address field: e-mail keyboard, no automatic capitals, the browser's saved address. */
export function EmailField({ label = 'E-mail', ...props }: Omit<TextFieldProps, 'label'> & { label?: string }) {
  return <TextField label={label} autoComplete="email" inputMode="email" autoCapitalize="none" {...props} />;
}

/** A hidden password field; `fresh` lets the browser suggest a new password instead of filling the saved one. */
export function PasswordField({ fresh = false, ...props }: TextFieldProps & { fresh?: boolean }) {
  return <TextField secureTextEntry autoComplete={fresh ? 'new-password' : 'current-password'} {...props} />;
}
