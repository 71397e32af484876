import { StyleSheet, View } from 'react-native';
import { signUpSchema } from '@/shared/schemas/auth';
import { useSignUp } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { TextField } from '@/components/forms/text-field';
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
      <TextField label="Shop name" value={form.values.shopName} onChangeText={(v) => form.setValue('shopName', v)} error={form.errors.shopName} autoComplete="organization" testID="sign-up-shop" />
      <TextField label="Your name" value={form.values.name} onChangeText={(v) => form.setValue('name', v)} error={form.errors.name} autoComplete="name" testID="sign-up-name" />
      <TextField
        label="E-mail"
        value={form.values.email}
        onChangeText={(v) => form.setValue('email', v)}
        error={form.errors.email}
        autoComplete="email"
        inputMode="email"
        autoCapitalize="none"
        testID="sign-up-email"
      />
      <TextField
        label="Password"
        hint="At least 10 characters. A few words you will remember work well."
        value={form.values.password}
        onChangeText={(v) => form.setValue('password', v)}
        error={form.errors.password}
        secureTextEntry
        autoComplete="new-password"
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
