import { StyleSheet, View } from 'react-native';
import { forgotPasswordSchema } from '@/shared/schemas/auth';
import { useForgotPassword } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { EmailField } from '@/components/forms/credential-fields';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { space } from '@/components/theme';
import { AuthHeading, AuthLinks } from './auth-links';

/** Asks for a reset link; the answer never says whether the address has an account. */
export function ForgotPasswordForm() {
  const forgot = useForgotPassword();
  const form = useZodForm(forgotPasswordSchema, { email: '' });
  const submit = () => {
    const input = form.validate();
    if (input) forgot.mutate(input, { onError: form.showError });
  };
  return (
    <View style={styles.col} testID="forgot-form">
      <AuthHeading title="Forgot your password?">Enter the e-mail you sign in with. We send a link to choose a new password.</AuthHeading>
      {forgot.isSuccess ? (
        <Notice tone="ok" title="Check your e-mail" testID="forgot-sent">
          {forgot.data.message}
        </Notice>
      ) : (
        <>
          <EmailField {...form.field('email')} onSubmitEditing={submit} testID="forgot-email" />
          <FormActions formError={form.formError} errorTitle="Not sent">
            <Button label="Send the link" onPress={submit} busy={forgot.isPending} testID="forgot-submit" />
          </FormActions>
        </>
      )}
      <AuthLinks links={[{ href: '/sign-in', label: 'Back to sign in', testID: 'link-sign-in' }]} />
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
