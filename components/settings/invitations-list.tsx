import { StyleSheet, Text, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/roles';
import { useInvitations, useRevokeInvitation } from '@/hooks/use-people';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { ThemedText } from '@/components/themed-text';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { shortDateTime } from './format';

/** Invitations not yet accepted, each with a way to withdraw it. */
export function InvitationsList() {
  const invitations = useInvitations();
  const revoke = useRevokeInvitation();
  if (invitations.isError) return <Notice tone="error" title="Invitations not loaded">{invitations.error.message}</Notice>;
  if (!invitations.data?.length) return null;
  return (
    <View style={styles.col} testID="pending-invitations">
      <ThemedText variant="subheading">Waiting for an answer</ThemedText>
      {invitations.data.map((inv) => (
        <View key={inv.id} style={styles.row} testID={`invitation-${inv.email}`}>
          <View style={styles.text}>
            <Text style={styles.email}>✉ {inv.email}</Text>
            <Text style={styles.meta}>
              {ROLE_LABELS[inv.role]} · sent {shortDateTime(inv.createdAt)} · link ends {shortDateTime(inv.expiresAt)}
            </Text>
          </View>
          <Button label="Withdraw" kind="secondary" onPress={() => revoke.mutate(inv.id)} busy={revoke.isPending && revoke.variables === inv.id} />
        </View>
      ))}
      {revoke.isError ? <Notice tone="error">{revoke.error.message}</Notice> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.sm },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: space.md,
    backgroundColor: colors.surface,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.md,
  },
  text: { flexGrow: 1, flexBasis: 220, gap: 2 },
  email: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
});
