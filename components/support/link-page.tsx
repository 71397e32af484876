import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { router } from 'expo-router';
import type { GuestLink } from '@/shared/schemas/guest-links';
import { WORKSHOP } from '@/shared/roles';
import { useGuestLink } from '@/hooks/use-guest-links';
import { useMe } from '@/hooks/use-session';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { WalkReportView } from '@/components/walk/walk-report-view';
import { colors, fonts, radius, space, type, wideBreakpoint } from '@/components/theme';
import { LinkStatusBadge } from './status-badge';
import { LinkActions } from './link-actions';
import { JobFromWalk } from './job-from-walk';
import { walkWords } from './link-card';

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' }) : '—');

/** One guest link: its facts and actions, and the customer's walk with steps, readings, photos and outcome. */
export function LinkPage({ id }: { id: number }) {
  const q = useGuestLink(id);
  const me = useMe();
  const { width } = useWindowDimensions();
  const [makingJob, setMakingJob] = useState(false);
  if (q.isPending) return <Screen><ActivityIndicator color={colors.accent} /></Screen>;
  if (q.error) return <Screen><Notice tone="error">{q.error.message}</Notice></Screen>;
  const { link, walk } = q.data;
  const canOpenJob = !!me && WORKSHOP.includes(me.role);
  const wide = width >= wideBreakpoint;

  return (
    <Screen testID="guest-link-page">
      <View style={styles.back}>
        <Button label="‹ Support" kind="secondary" onPress={() => router.push('/support')} testID="link-back" />
      </View>
      <View style={styles.title}>
        <ThemedText variant="title" accessibilityRole="header">
          {link.customerName}
        </ThemedText>
        <LinkStatusBadge status={link.status} testID="link-status" />
      </View>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <Facts link={link} wide={wide} />
        <View style={[styles.side, wide && styles.half]}>
          <LinkActions link={link} />
          {link.jobId ? (
            <Notice tone="ok" title="Part of a job" testID="link-job">
              The car came in and this walk belongs to a job now.
            </Notice>
          ) : null}
          {link.jobId && canOpenJob ? <Button label="Open the job" kind="secondary" onPress={() => router.push(`/jobs/${link.jobId}`)} testID="link-open-job" /> : null}
          {walk && !link.jobId && !makingJob ? <Button label="Turn into a job…" onPress={() => setMakingJob(true)} testID="link-to-job" /> : null}
          {makingJob && !link.jobId ? <JobFromWalk link={link} onCancel={() => setMakingJob(false)} /> : null}
        </View>
      </View>
      <ThemedText variant="heading">The customer's walk</ThemedText>
      {walk ? <WalkReportView walk={walk} pdfHref={null} backHref={null} /> : <ThemedText muted testID="link-no-walk">{walkWords(link)}.</ThemedText>}
    </Screen>
  );
}

function Facts({ link, wide }: { link: GuestLink; wide: boolean }) {
  const rows: Array<[string, string]> = [
    ['Tree', `${link.tree.title} (version ${link.tree.version})`],
    ['E-mail', link.customerEmail ?? 'None: the link was copied'],
    ['Walk', walkWords(link)],
    ['Created', `${when(link.createdAt)}${link.createdBy ? ` by ${link.createdBy.name}` : ''}`],
    ['Works until', when(link.expiresAt)],
    ['Sent by e-mail', link.sentCount ? `${link.sentCount} time${link.sentCount === 1 ? '' : 's'}, last ${when(link.lastSentAt)}` : 'Not e-mailed'],
    ['First opened', when(link.openedAt)],
    ['Safety notice accepted', when(link.acknowledgedAt)],
    ['Handled', link.handledAt ? `${when(link.handledAt)}${link.handledBy ? ` by ${link.handledBy.name}` : ''}` : 'Not yet'],
  ];
  if (link.revokedAt) rows.push(['Revoked', when(link.revokedAt)]);
  return (
    <View style={[styles.facts, wide && styles.half]} testID="link-facts">
      {rows.map(([k, v]) => (
        <View key={k} style={styles.fact}>
          <Text style={styles.k}>{k}</Text>
          <Text style={styles.v}>{v}</Text>
        </View>
      ))}
      {link.note ? (
        <View style={styles.fact}>
          <Text style={styles.k}>Internal note</Text>
          <Text style={styles.v}>{link.note}</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  back: { flexDirection: 'row' },
  title: { gap: space.xs },
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  // Side by side only on a wide screen: flex 1 in a phone's column would squash the boxes.
  half: { flex: 1 },
  side: { gap: space.md },
  facts: { gap: space.sm, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, padding: space.lg },
  fact: { gap: 2 },
  k: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted },
  v: { ...type.body, color: colors.ink },
});
