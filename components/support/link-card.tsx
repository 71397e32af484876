import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import type { GuestLink } from '@/shared/schemas/guest-links';
import { WALK_OUTCOME_LABELS, type WalkOutcome } from '@/shared/schemas/walks';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { LinkStatusBadge } from './status-badge';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short' });

/** What a link's walk has come to, in a few words. */
export function walkWords(link: GuestLink): string {
  const w = link.walk;
  if (!w) return link.openedAt ? 'Opened; safety notice not yet accepted' : 'Not opened yet';
  if (w.status === 'finished') return `${w.outcome ? WALK_OUTCOME_LABELS[w.outcome as WalkOutcome] : 'Finished'}${w.causeText ? `: ${w.causeText}` : ''}`;
  return `${w.stepCount} step${w.stepCount === 1 ? '' : 's'} so far`;
}

/** One guest link in the support lists; opens its page. */
export function LinkCard({ link }: { link: GuestLink }) {
  const review = link.walk && !link.handledAt;
  return (
    <Link href={`/support/${link.id}`} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={`${link.customerName}: ${link.tree.title}`} testID={`guest-link-${link.id}`} style={styles.card}>
        <View style={styles.top}>
          <Text style={styles.name} numberOfLines={1}>
            {link.customerName} ›
          </Text>
          <LinkStatusBadge status={link.status} />
        </View>
        <Text style={styles.tree} numberOfLines={2}>
          {link.tree.title}
        </Text>
        <Text style={styles.walk}>{walkWords(link)}</Text>
        <Text style={styles.meta}>
          Sent {day(link.createdAt)}
          {link.createdBy ? ` by ${link.createdBy.name}` : ''} · until {day(link.expiresAt)}
          {link.handledAt ? ' · ✔ handled' : review ? ' · ● to review' : ''}
          {link.jobId ? ' · job created' : ''}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    minHeight: touchTarget * 2,
    flexGrow: 1,
    flexBasis: 300,
    backgroundColor: colors.surface,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.lg,
    gap: space.xs,
  },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm, justifyContent: 'space-between' },
  name: { fontFamily: fonts.bold, fontSize: 19, color: colors.accentDark, flexShrink: 1 },
  tree: { ...type.body, color: colors.ink },
  walk: { ...type.label, color: colors.ink },
  meta: { ...type.small, color: colors.inkMuted },
});
