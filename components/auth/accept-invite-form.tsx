import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { ROLE_LABELS } from '@/shared/roles';
import { acceptInvitationSchema } from '@/shared/schemas/people';
import { useAcceptInvitation, useInvitationLink } from '@/hooks/use-session';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { TextField } from '@/components/forms/text-field';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { colors, space } from '@/components/theme';
import { AuthHeading, AuthLinks } from './auth-links';

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
    return (
      <View style={styles.col} testID="invite-refused">
        <AuthHeading title="Join a shop" />
        <Notice tone="error" title="This invitation cannot be used">
          {link.error?.message ?? 'The link is missing its code. Open the link from the e-mail again.'}
        </Notice>
        <AuthLinks links={[{ href: '/sign-in', label: 'Sign in' }]} />
      </View>
    );
  }
  if (link.isPending) return <ActivityIndicator color={colors.accent} />;
  const { shopName, email, role } = link.data;
  return (
    <View style={styles.col} testID="accept-form">
      <AuthHeading title={`Join ${shopName}`}>{`You are invited as ${ROLE_LABELS[role].toLowerCase()}. You will sign in as ${email}.`}</AuthHeading>
      <TextField label="Your name" value={form.values.name} onChangeText={(v) => form.setValue('name', v)} error={form.errors.name} autoComplete="name" testID="accept-name" />
      <TextField
        label="Choose a password"
        hint="At least 10 characters."
        value={form.values.password}
        onChangeText={(v) => form.setValue('password', v)}
        error={form.errors.password ?? form.errors.token}
        secureTextEntry
        autoComplete="new-password"
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
