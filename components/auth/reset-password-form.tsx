import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { resetPasswordSchema } from '@/shared/schemas/auth';
import { useResetLink, useResetPassword } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { PasswordField } from '@/components/forms/credential-fields';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { colors, space } from '@/components/theme';
import { AuthHeading } from './auth-links';
import { LinkRefused } from './link-refused';

/** Sets a new password from an e-mailed link, then signs in and opens the app. */
export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const link = useResetLink(token);
  const reset = useResetPassword();
  const form = useZodForm(resetPasswordSchema, { token, password: '' });
  const submit = () => {
    const input = form.validate();
    if (input) reset.mutate(input, { onError: form.showError, onSuccess: () => router.replace('/') });
  };

  if (!token || link.isError) {
    return (
      <LinkRefused
        testID="reset-link-refused"
        heading="Choose a new password"
        title="This link cannot be used"
        error={link.error}
        links={[{ href: '/forgot-password', label: 'Ask for a new link' }, { href: '/sign-in', label: 'Sign in' }]}
      />
    );
  }
  if (link.isPending) return <ActivityIndicator color={colors.accent} />;
  return (
    <View style={styles.col} testID="reset-form">
      <AuthHeading title="Choose a new password">{`For ${link.data.email} at ${link.data.shopName}.`}</AuthHeading>
      <PasswordField
        fresh
        label="New password"
        hint="At least 10 characters."
        {...form.field('password')}
        error={form.errors.password ?? form.errors.token}
        onSubmitEditing={submit}
        testID="reset-password"
      />
      <FormActions formError={form.formError} errorTitle="Password not changed">
        <Button label="Save and sign in" onPress={submit} busy={reset.isPending} testID="reset-submit" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
