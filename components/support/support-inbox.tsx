import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { GUEST_LINK_STATUSES, GUEST_LINK_STATUS_LABELS, type GuestLinkStatus } from '@/shared/schemas/guest-links';
import { useGuestLinks } from '@/hooks/use-guest-links';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, space } from '@/components/theme';
import { LinkCard } from './link-card';

type Filter = GuestLinkStatus | 'all';
const FILTERS = [{ value: 'all' as Filter, label: 'All' }, ...GUEST_LINK_STATUSES.map((s) => ({ value: s as Filter, label: GUEST_LINK_STATUS_LABELS[s] }))];

/** Support: guest walks waiting for review first, then every link with its status; send a new one. */
export function SupportInbox() {
  const [filter, setFilter] = useState<Filter>('all');
  const links = useGuestLinks(filter === 'all' ? undefined : filter);
  const all = links.data ?? [];
  const toReview = all.filter((l) => l.walk && !l.handledAt);
  const rest = all.filter((l) => !(l.walk && !l.handledAt));

  return (
    <Screen testID="support-inbox">
      <ThemedText variant="title" accessibilityRole="header">
        Support
      </ThemedText>
      <ThemedText muted>Send a customer a guided check by link, and review the walks they send back.</ThemedText>
      <View style={styles.actions}>
        <Button label="+ Send a guest link" onPress={() => router.push('/support/new')} testID="support-new-link" />
      </View>
      <SegmentedChoice label="Show" options={FILTERS} value={filter} onChange={setFilter} testID="support-filter" />
      {links.isPending ? <ActivityIndicator color={colors.accent} /> : null}
      {links.error ? <Notice tone="error">{links.error.message}</Notice> : null}
      {toReview.length ? (
        <View style={styles.section} testID="support-review">
          <ThemedText variant="heading">Guest walks to review ({toReview.length})</ThemedText>
          <View style={styles.cards}>
            {toReview.map((l) => (
              <LinkCard key={l.id} link={l} />
            ))}
          </View>
        </View>
      ) : null}
      <View style={styles.section} testID="support-links">
        <ThemedText variant="heading">{toReview.length ? 'Other links' : 'Links'}</ThemedText>
        {links.data && !rest.length ? <ThemedText muted>{all.length ? 'Nothing else here.' : 'No links yet. Send one to a customer who fitted parts themselves.'}</ThemedText> : null}
        <View style={styles.cards}>
          {rest.map((l) => (
            <LinkCard key={l.id} link={l} />
          ))}
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  section: { gap: space.md },
  cards: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
