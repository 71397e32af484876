import { StyleSheet, View } from 'react-native';
import type { GuestLinkClosed } from '@/shared/schemas/guest-links';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { space } from '@/components/theme';
import { ShopContactButtons } from './shop-contact';

/** The page for a link that expired or that the shop closed: what happened and how to reach the shop. */
export function LinkClosed({ closed }: { closed: GuestLinkClosed }) {
  const shop = closed.error.details.shop;
  const expired = closed.error.code === 'link_expired';
  return (
    <Screen testID={expired ? 'guest-link-expired' : 'guest-link-revoked'}>
      <ThemedText variant="subheading" muted>
        {shop.name}
      </ThemedText>
      <ThemedText variant="title" accessibilityRole="header">
        {expired ? 'This link has expired' : 'This link has been closed'}
      </ThemedText>
      <Notice tone="info" title={expired ? 'Links last a limited time' : 'The shop closed this link'}>
        {expired
          ? `Links to a guided check work for a limited time. Whatever you recorded before is safe with ${shop.name}. To carry on, ask them for a new link.`
          : `${shop.name} has closed this link, so it no longer opens the check. If you still need help, get in touch with them.`}
      </Notice>
      <View style={styles.contact}>
        <ThemedText variant="subheading">Contact {shop.name}</ThemedText>
        <ShopContactButtons shop={shop} />
      </View>
    </Screen>
  );
}

/** The page for a link that is not valid at all (mistyped, cut short, or replaced by a newer one). */
export function LinkInvalid({ message }: { message: string }) {
  return (
    <Screen testID="guest-link-invalid">
      <ThemedText variant="title" accessibilityRole="header">
        This link does not open a check
      </ThemedText>
      <Notice tone="info" title="What to do">
        {message}
      </Notice>
      <ThemedText muted>If the shop sent you a newer mail, use the link in that one: each new link replaces the one before.</ThemedText>
    </Screen>
  );
}

const styles = StyleSheet.create({
  contact: { gap: space.sm },
});
