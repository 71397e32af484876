import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { Link, router } from 'expo-router';
import type { Job } from '@/shared/schemas/jobs';
import { useJobs } from '@/hooks/use-jobs';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { TextField } from '@/components/forms/text-field';
import { useDebouncedValue } from '@/components/trees/use-debounced-value';
import { colors, fonts, radius, space, touchTarget, type, wideBreakpoint } from '@/components/theme';
import { shortDate, vehicleLine } from './job-vehicle';
import { LoadError } from '@/components/load-error';

const PAGE_SIZE = 20;

/** The Jobs screen: search by RO, VIN or customer; open walks first; cards on a phone, a table on a wide screen. */
export function JobList() {
  const [text, setText] = useState('');
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(text.trim(), 300);
  const jobs = useJobs({ q: q || undefined, page, pageSize: PAGE_SIZE });
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  const pages = jobs.data ? Math.max(1, Math.ceil(jobs.data.total / PAGE_SIZE)) : 1;

  return (
    <Screen testID="job-list">
      <View style={styles.head}>
        <ThemedText variant="title" accessibilityRole="header" style={styles.grow}>
          Jobs
        </ThemedText>
        <Button label="New job" onPress={() => router.push('/jobs/new')} testID="job-new" />
      </View>
      <TextField
        label="Search jobs"
        placeholder="RO number, VIN or customer"
        value={text}
        onChangeText={(t) => {
          setText(t);
          setPage(1);
        }}
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
        testID="job-search"
      />
      {jobs.isPending ? (
        <View style={styles.row}>
          <ActivityIndicator color={colors.accent} />
          <ThemedText muted>Loading jobs…</ThemedText>
        </View>
      ) : jobs.isError ? (
        <LoadError title="Could not load the jobs" error={jobs.error} onRetry={jobs.refetch} busy={jobs.isFetching} />
      ) : jobs.data.items.length === 0 ? (
        <Notice tone="info" title={q ? 'No job matches' : 'No jobs yet'} testID="jobs-empty">
          {q ? `Nothing matches “${q}”. Check the RO number or VIN, or search by the customer's name.` : 'Create the first job for a car that came back after an install.'}
        </Notice>
      ) : wide ? (
        <JobTable jobs={jobs.data.items} />
      ) : (
        <View style={styles.col}>{jobs.data.items.map((j) => <JobCard key={j.id} job={j} />)}</View>
      )}
      {jobs.data && pages > 1 ? (
        <View style={styles.pager} testID="job-pager">
          <Button label="‹ Previous" kind="secondary" disabled={page <= 1} onPress={() => setPage((p) => p - 1)} testID="job-page-prev" />
          <Text style={styles.pageText}>
            Page {page} of {pages} · {jobs.data.total} jobs
          </Text>
          <Button label="Next ›" kind="secondary" disabled={page >= pages} onPress={() => setPage((p) => p + 1)} testID="job-page-next" />
        </View>
      ) : null}
    </Screen>
  );
}

function OpenBadge({ n }: { n: number }) {
  if (!n) return null;
  return <Text style={styles.open}>● {n === 1 ? '1 open walk' : `${n} open walks`}</Text>;
}

function JobCard({ job }: { job: Job }) {
  return (
    <Link href={`/jobs/${job.id}`} asChild>
      {/* No separate label: the link is named by the text it shows, so speech and sight agree. */}
      <Pressable accessibilityRole="link" testID={`job-card-${job.roNumber}`} style={styles.card}>
        <View style={styles.cardTop}>
          <Text style={styles.ro}>RO {job.roNumber}</Text>
          <OpenBadge n={job.openWalks} />
        </View>
        <Text style={styles.customer}>{job.customerName}</Text>
        <Text style={styles.muted}>{vehicleLine(job)}</Text>
        {job.vin ? <Text style={styles.vin}>{job.vin}</Text> : null}
      </Pressable>
    </Link>
  );
}

function JobTable({ jobs }: { jobs: Job[] }) {
  const cols = ['RO', 'Customer', 'Vehicle', 'VIN', 'Walks', 'Updated'];
  return (
    <View style={styles.table} role="table" testID="job-table">
      <View style={[styles.tr, styles.th]} role="row">
        {cols.map((c, i) => (
          <Text key={c} role="columnheader" style={[styles.thText, { flex: FLEX[i] }]}>
            {c}
          </Text>
        ))}
      </View>
      {jobs.map((j) => (
        <Link key={j.id} href={`/jobs/${j.id}`} asChild>
          <Pressable role="row" accessibilityLabel={`RO ${j.roNumber}, ${j.customerName}`} testID={`job-row-${j.roNumber}`} style={styles.tr}>
            <Text role="cell" style={[styles.ro, { flex: FLEX[0] }]}>{j.roNumber}</Text>
            <Text role="cell" style={[styles.td, { flex: FLEX[1] }]}>{j.customerName}</Text>
            <Text role="cell" style={[styles.td, { flex: FLEX[2] }]}>{vehicleLine(j)}</Text>
            <Text role="cell" style={[styles.vin, { flex: FLEX[3] }]}>{j.vin ?? '—'}</Text>
            <View role="cell" style={{ flex: FLEX[4] }}>
              {j.openWalks ? <OpenBadge n={j.openWalks} /> : <Text style={styles.muted}>{j.walkCount ? `${j.walkCount} done` : '—'}</Text>}
            </View>
            <Text role="cell" style={[styles.muted, { flex: FLEX[5] }]}>{shortDate(j.updatedAt)}</Text>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const FLEX = [1, 1.4, 1.8, 1.8, 1.1, 1];

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  grow: { flex: 1 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  col: { gap: space.md },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.xs, minHeight: touchTarget * 2 },
  cardTop: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  ro: { fontFamily: fonts.bold, fontSize: 18, color: colors.accentDark },
  customer: { ...type.subheading, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  vin: { fontFamily: fonts.semibold, fontSize: 14, letterSpacing: 0.5, color: colors.ink },
  open: { ...type.small, fontFamily: fonts.bold, color: colors.caution },
  table: { backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, overflow: 'hidden' },
  tr: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.lg, minHeight: touchTarget + 8, borderBottomWidth: 1, borderBottomColor: colors.line },
  th: { backgroundColor: colors.paper, minHeight: touchTarget },
  thText: { ...type.label, color: colors.inkMuted },
  td: { ...type.body, fontSize: 16, color: colors.ink },
  pager: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  pageText: { ...type.small, color: colors.inkMuted },
});
