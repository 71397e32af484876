import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import type { GuestWalkState } from '@/shared/schemas/guest-links';
import { isClosed, useAcknowledgeSafety, useGuestOpen, useGuestState, useGuestWalkSource } from '@/hooks/use-guest-walk';
import { WalkScreen } from '@/components/walk/walk-screen';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { colors, fonts, maxContentWidth, space, type } from '@/components/theme';
import { LinkClosed, LinkInvalid } from './link-closed';
import { SafetyNotice } from './safety-notice';
import { ShopContactButtons } from './shop-contact';

/**
 * A customer's guided check at /g/<token>: open the link (this binds the
 * browser to it), the safety notice until accepted, then the same walk
 * screen technicians use. Closed links get a page with the shop's contact.
 */
export function GuestWalkPage({ token }: { token: string }) {
  const open = useGuestOpen(token);
  if (open.isPending) return <Waiting text="Opening your check…" />;
  if (open.error) {
    if ((open.error as { status?: number }).status === 0) return <Problem message={open.error.message} onRetry={() => void open.refetch()} />;
    return <LinkInvalid message={open.error.message} />;
  }
  if (isClosed(open.data)) return <LinkClosed closed={open.data} />;
  return <GuestLink linkId={open.data.linkId} />;
}

function GuestLink({ linkId }: { linkId: number }) {
  const state = useGuestState(linkId);
  const ack = useAcknowledgeSafety(linkId);
  const source = useGuestWalkSource(linkId);
  if (state.isPending) return <Waiting text="Opening your check…" />;
  if (state.error) return <Problem message={state.error.message} onRetry={() => void state.refetch()} />;
  if (isClosed(state.data)) return <LinkClosed closed={state.data} />;
  const s = state.data;
  if (!s.acknowledgedAt || !s.walk) {
    return <SafetyNotice state={s} onAccept={() => ack.mutate()} busy={ack.isPending} error={ack.error?.message} />;
  }
  return (
    <View style={styles.root} testID="guest-walk">
      <GuestBar state={s} />
      <View style={styles.walk}>
        <WalkScreen source={source} />
      </View>
    </View>
  );
}

/** A slim band over the walk: whose check this is and how to reach the shop. */
function GuestBar({ state }: { state: GuestWalkState }) {
  const finished = state.walk?.walk.status === 'finished';
  return (
    <View style={styles.bar}>
      <View style={styles.barInner}>
        <Text style={styles.shop} numberOfLines={1}>
          {state.shop.name}
        </Text>
        <Text style={styles.small} numberOfLines={1}>
          Guided check for {state.customerName} · works until {new Date(state.expiresAt).toLocaleDateString()}
        </Text>
        {finished ? (
          <Notice tone="ok" title="Sent to the shop" testID="guest-finished">
            {`Thank you. ${state.shop.name} has your answers, readings and photos and will get back to you. Nothing more is needed here.`}
          </Notice>
        ) : (
          <Text style={styles.small}>⚠ Where a step says to stop, stop and call the shop or a professional.</Text>
        )}
        {finished ? <ShopContactButtons shop={state.shop} /> : null}
      </View>
    </View>
  );
}

function Waiting({ text }: { text: string }) {
  return (
    <Screen testID="guest-loading">
      <ActivityIndicator color={colors.accent} />
      <ThemedText muted>{text}</ThemedText>
    </Screen>
  );
}

function Problem({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <Screen testID="guest-problem">
      <Notice tone="error" title="The check did not open">
        {message}
      </Notice>
      <Button label="Try again" kind="secondary" onPress={onRetry} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  walk: { flex: 1 },
  bar: { backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.line, paddingHorizontal: space.lg, paddingVertical: space.sm, alignItems: 'center' },
  barInner: { width: '100%', maxWidth: maxContentWidth, gap: space.xs },
  shop: { fontFamily: fonts.bold, fontSize: 18, color: colors.accentDark },
  small: { ...type.small, color: colors.inkMuted },
});
