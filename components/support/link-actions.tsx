import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { GuestLink, GuestLinkIssued } from '@/shared/schemas/guest-links';
import { useResendGuestLink, useRevokeGuestLink, useSetGuestLinkHandled } from '@/hooks/use-guest-links';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { IssuedLink } from './issued-link';

/** Resend (a fresh address), revoke with a confirmation, and mark the walk handled. */
export function LinkActions({ link }: { link: GuestLink }) {
  const resend = useResendGuestLink(link.id);
  const revoke = useRevokeGuestLink(link.id);
  const handled = useSetGuestLinkHandled(link.id);
  const [issued, setIssued] = useState<GuestLinkIssued>();
  const [confirming, setConfirming] = useState(false);
  const open = link.status !== 'revoked' && link.status !== 'expired';
  const error = resend.error ?? revoke.error ?? handled.error;

  return (
    <View style={styles.wrap} testID="link-actions">
      {error ? <Notice tone="error">{error.message}</Notice> : null}
      {issued ? <IssuedLink issued={issued} /> : null}
      <View style={styles.row}>
        {link.walk ? (
          <Button
            label={link.handledAt ? 'Mark as not handled' : '✔ Mark as handled'}
            kind={link.handledAt ? 'secondary' : 'primary'}
            onPress={() => handled.mutate(!link.handledAt)}
            busy={handled.isPending}
            testID="link-handled"
          />
        ) : null}
        {open && link.customerEmail ? (
          <Button label="Resend by e-mail" kind="secondary" onPress={() => resend.mutate('email', { onSuccess: setIssued })} busy={resend.isPending && resend.variables === 'email'} testID="link-resend" />
        ) : null}
        {open ? (
          <Button label="New link to copy" kind="secondary" onPress={() => resend.mutate('copy', { onSuccess: setIssued })} busy={resend.isPending && resend.variables === 'copy'} testID="link-new-copy" />
        ) : null}
        {open && !confirming ? <Button label="Revoke…" kind="secondary" onPress={() => setConfirming(true)} testID="link-revoke" /> : null}
      </View>
      {open ? <Text style={styles.hint}>A resent or copied link replaces the one before; a customer already walking keeps their place.</Text> : null}
      {confirming && open ? (
        <View style={styles.confirm} accessibilityRole="alert" testID="link-revoke-confirm">
          <Text style={styles.confirmText}>⚠ Revoke this link? {link.customerName} will no longer be able to open it or add to the walk. What is recorded stays here.</Text>
          <View style={styles.row}>
            <Button label="Yes, revoke it" kind="danger" onPress={() => revoke.mutate(undefined, { onSuccess: () => setConfirming(false) })} busy={revoke.isPending} testID="link-revoke-yes" />
            <Button label="Keep it" kind="secondary" onPress={() => setConfirming(false)} testID="link-revoke-no" />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  hint: { ...type.small, color: colors.inkMuted },
  confirm: { gap: space.md, padding: space.lg, borderRadius: radius.sm, borderLeftWidth: 6, borderLeftColor: colors.danger, backgroundColor: colors.dangerSoft },
  confirmText: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
});
