import { View, StyleSheet } from 'react-native';
import { signInSchema } from '@/shared/schemas/auth';
import { useSignIn } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { EmailField, PasswordField } from '@/components/forms/credential-fields';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { space } from '@/components/theme';
import { AuthHeading, AuthLinks } from './auth-links';

/** E-mail and password; on success the gate moves the person into the app. */
export function SignInForm() {
  const signIn = useSignIn();
  const form = useZodForm(signInSchema, { email: '', password: '' });
  const submit = () => {
    const input = form.validate();
    if (input) signIn.mutate(input, { onError: form.showError });
  };
  return (
    <View style={styles.col} testID="sign-in-form">
      <AuthHeading title="Sign in" />
      <EmailField {...form.field('email')} testID="sign-in-email" />
      <PasswordField label="Password" {...form.field('password')} onSubmitEditing={submit} testID="sign-in-password" />
      <FormActions formError={form.formError} errorTitle="Not signed in">
        <Button label="Sign in" onPress={submit} busy={signIn.isPending} testID="sign-in-submit" />
      </FormActions>
      <AuthLinks
        links={[
          { href: '/forgot-password', label: 'Forgot your password?', testID: 'link-forgot' },
          { href: '/sign-up', label: 'New shop? Sign up', testID: 'link-sign-up' },
        ]}
      />
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
