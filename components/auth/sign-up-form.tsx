import { StyleSheet, View } from 'react-native';
import { signUpSchema } from '@/shared/schemas/auth';
import { useSignUp } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { TextField } from '@/components/forms/text-field';
import { EmailField, PasswordField } from '@/components/forms/credential-fields';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { space } from '@/components/theme';
import { AuthHeading, AuthLinks } from './auth-links';

/** Opens a new shop with its first owner; on success the gate moves the owner into the app. */
export function SignUpForm() {
  const signUp = useSignUp();
  const form = useZodForm(signUpSchema, { shopName: '', name: '', email: '', password: '' });
  const submit = () => {
    const input = form.validate();
    if (input) signUp.mutate(input, { onError: form.showError });
  };
  return (
    <View style={styles.col} testID="sign-up-form">
      <AuthHeading title="Open your shop on Baywalk">You become its owner and can invite your team afterwards.</AuthHeading>
      <TextField label="Shop name" {...form.field('shopName')} autoComplete="organization" testID="sign-up-shop" />
      <TextField label="Your name" {...form.field('name')} autoComplete="name" testID="sign-up-name" />
      <EmailField {...form.field('email')} testID="sign-up-email" />
      <PasswordField
        fresh
        label="Password"
        hint="At least 10 characters. A few words you will remember work well."
        {...form.field('password')}
        onSubmitEditing={submit}
        testID="sign-up-password"
      />
      <FormActions formError={form.formError} errorTitle="Shop not opened">
        <Button label="Open the shop" onPress={submit} busy={signUp.isPending} testID="sign-up-submit" />
      </FormActions>
      <AuthLinks links={[{ href: '/sign-in', label: 'Already have an account? Sign in', testID: 'link-sign-in' }]} />
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
