import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLES, ROLE_LABELS, type Role } from '@/shared/roles';
import { inviteSchema } from '@/shared/schemas/people';
import { useInvite } from '@/hooks/use-people';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { ThemedText } from '@/components/themed-text';
import { TextField } from '@/components/forms/text-field';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { FormActions } from '@/components/forms/form-actions';
import { useZodForm } from '@/components/forms/use-zod-form';
import { colors, radius, space } from '@/components/theme';

const ROLE_CHOICES = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** E-mails a single-use invitation link (valid 7 days) with the chosen role. */
export function InviteForm() {
  const invite = useInvite();
  const [sentTo, setSentTo] = useState<string>();
  const form = useZodForm(inviteSchema, { email: '', role: 'tech' as Role });
  const submit = () => {
    const input = form.validate();
    if (!input) return;
    invite.mutate(input, {
      onError: form.showError,
      onSuccess: () => {
        setSentTo(input.email);
        form.setValues({ email: '', role: input.role });
      },
    });
  };
  return (
    <View style={styles.box} testID="invite-form">
      <ThemedText variant="heading" accessibilityRole="header">
        Invite someone
      </ThemedText>
      <ThemedText muted>They get an e-mail with a link that works once, for 7 days, to choose their name and password.</ThemedText>
      {sentTo ? (
        <Notice tone="ok" title="Invitation sent" testID="invite-sent">
          {`An invitation is on its way to ${sentTo}.`}
        </Notice>
      ) : null}
      <TextField
        label="E-mail"
        value={form.values.email}
        onChangeText={(v) => {
          setSentTo(undefined);
          form.setValue('email', v);
        }}
        error={form.errors.email}
        inputMode="email"
        autoCapitalize="none"
        autoComplete="off"
        testID="invite-email"
      />
      <SegmentedChoice label="Role" options={ROLE_CHOICES} value={form.values.role} onChange={(r) => form.setValue('role', r)} error={form.errors.role} testID="invite-role" />
      <FormActions formError={form.formError} errorTitle="Not sent">
        <Button label="Send invitation" onPress={submit} busy={invite.isPending} testID="invite-submit" />
      </FormActions>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md },
});
