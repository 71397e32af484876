import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { ROLE_LABELS } from '@/shared/roles';
import { acceptInvitationSchema } from '@/shared/schemas/people';
import { useAcceptInvitation, useInvitationLink } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { TextField } from '@/components/forms/text-field';
import { PasswordField } from '@/components/forms/credential-fields';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { colors, space } from '@/components/theme';
import { AuthHeading } from './auth-links';
import { LinkRefused } from './link-refused';

/** Accepts an invitation: the person picks their name and password and is signed in. */
export function AcceptInviteForm({ token }: { token: string }) {
  const router = useRouter();
  const link = useInvitationLink(token);
  const accept = useAcceptInvitation();
  const form = useZodForm(acceptInvitationSchema, { token, name: '', password: '' });
  const submit = () => {
    const input = form.validate();
    if (input) accept.mutate(input, { onError: form.showError, onSuccess: () => router.replace('/') });
  };

  if (!token || link.isError) {
    return <LinkRefused testID="invite-refused" heading="Join a shop" title="This invitation cannot be used" error={link.error} links={[{ href: '/sign-in', label: 'Sign in' }]} />;
  }
  if (link.isPending) return <ActivityIndicator color={colors.accent} />;
  const { shopName, email, role } = link.data;
  return (
    <View style={styles.col} testID="accept-form">
      <AuthHeading title={`Join ${shopName}`}>{`You are invited as ${ROLE_LABELS[role].toLowerCase()}. You will sign in as ${email}.`}</AuthHeading>
      <TextField label="Your name" {...form.field('name')} autoComplete="name" testID="accept-name" />
      <PasswordField
        fresh
        label="Choose a password"
        hint="At least 10 characters."
        {...form.field('password')}
        error={form.errors.password ?? form.errors.token}
        onSubmitEditing={submit}
        testID="accept-password"
      />
      <FormActions formError={form.formError} errorTitle="Not joined">
        <Button label="Join and sign in" onPress={submit} busy={accept.isPending} testID="accept-submit" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({ col: { gap: space.lg } });
