import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import type { CauseRow, ComebackRow, ExportTable, RepeatRow, TimeRow, UnresolvedRow, WeekRow } from '@/shared/schemas/patterns';
import { INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { colors, fonts, space, touchTarget, type } from '@/components/theme';
import type { TableColumn } from './data-table';
import { day, duration, percent, steps } from './format';

/** A table section: heading, one line saying what it counts, the CSV download, then the table. */
export function TableSection({ title, about, exportHref, table, children, testID }: { title: string; about: string; exportHref: string; table: ExportTable; children: ReactNode; testID: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <View style={styles.head}>
        <View style={styles.headText}>
          <Text style={styles.title} accessibilityRole="header">
            {title}
          </Text>
          <Text style={styles.about}>{about}</Text>
        </View>
        {/* A real link, so the browser downloads the streamed file with the session cookie. */}
        <Text
          role="link"
          {...({ href: exportHref, hrefAttrs: { download: `baywalk-${table}.csv` } } as object)}
          style={styles.csv}
          testID={`export-${table}`}
          accessibilityLabel={`Download ${title} as CSV`}
        >
          ⇩ CSV
        </Text>
      </View>
      {children}
    </View>
  );
}

const num = (n: number) => <Text style={styles.num}>{n}</Text>;

export const causeColumns: TableColumn<CauseRow>[] = [
  { id: 'cause', header: 'Cause', value: (r) => r.title, primary: true },
  { id: 'walks', header: 'Walks', value: (r) => r.walks, numeric: true, render: (r) => num(r.walks) },
  { id: 'share', header: 'Share of finished', value: (r) => r.share, numeric: true, render: (r) => <Text style={styles.num}>{percent(r.share)}</Text> },
];

export const repeatColumns: TableColumn<RepeatRow>[] = [
  { id: 'cause', header: 'Cause', value: (r) => r.title, primary: true },
  { id: 'install', header: 'After install', value: (r) => INSTALL_TYPE_LABELS[r.installType] },
  { id: 'jobs', header: 'Jobs', value: (r) => r.jobs, numeric: true, render: (r) => num(r.jobs) },
  { id: 'walks', header: 'Walks', value: (r) => r.walks, numeric: true, render: (r) => num(r.walks) },
  { id: 'last', header: 'Last found', value: (r) => r.lastFoundAt, render: (r) => <Text style={styles.td}>{day(r.lastFoundAt)}</Text> },
];

const walkLink = (id: number, words: string, testID: string) => (
  <Link href={`/walks/${id}`} style={styles.link} testID={testID}>
    {words}
  </Link>
);

export const comebackColumns: TableColumn<ComebackRow>[] = [
  {
    id: 'vehicle',
    header: 'Vehicle',
    value: (r) => r.vehicle,
    primary: true,
    render: (r) => (
      <View>
        <Text style={styles.strong}>{r.vehicle || 'Vehicle'}</Text>
        <Text style={styles.muted}>VIN {r.vin}</Text>
      </View>
    ),
  },
  {
    id: 'first',
    header: 'Closed as fixed',
    value: (r) => r.first.at,
    render: (r) => (
      <View>
        {walkLink(r.first.walkId, `${r.first.roNumber} · ${day(r.first.at)}`, `comeback-first-${r.first.walkId}`)}
        <Text style={styles.muted}>{r.first.causeCode ? r.first.causeTitle : r.first.treeTitle}</Text>
      </View>
    ),
  },
  {
    id: 'again',
    header: 'Back again',
    value: (r) => r.again.at,
    render: (r) => (
      <View>
        {walkLink(r.again.walkId, `${r.again.roNumber} · ${day(r.again.at)}`, `comeback-again-${r.again.walkId}`)}
        <Text style={styles.muted}>{r.again.causeCode ? r.again.causeTitle : r.again.treeTitle}</Text>
      </View>
    ),
  },
  { id: 'days', header: 'Days later', value: (r) => r.days, numeric: true, render: (r) => num(r.days) },
  {
    id: 'match',
    header: 'Same',
    value: (r) => (r.sameCause ? 2 : 0) + (r.sameSymptom ? 1 : 0),
    render: (r) => <Text style={styles.td}>{[r.sameSymptom ? '✓ symptom' : '', r.sameCause ? '✓ cause' : ''].filter(Boolean).join(', ')}</Text>,
  },
];

export const unresolvedColumns: TableColumn<UnresolvedRow>[] = [
  { id: 'tree', header: 'Tree', value: (r) => r.treeTitle, primary: true },
  { id: 'finished', header: 'Finished', value: (r) => r.finished, numeric: true, render: (r) => num(r.finished) },
  { id: 'referred', header: 'Referred on', value: (r) => r.referred, numeric: true, render: (r) => num(r.referred) },
  { id: 'notFixed', header: 'Not fixed', value: (r) => r.notFixed, numeric: true, render: (r) => num(r.notFixed) },
  { id: 'share', header: 'Share', value: (r) => r.share, numeric: true, render: (r) => <Text style={styles.num}>{percent(r.share)}</Text> },
];

export const timeColumns: TableColumn<TimeRow>[] = [
  { id: 'tree', header: 'Tree', value: (r) => r.treeTitle, primary: true },
  { id: 'walks', header: 'Walks to a cause', value: (r) => r.walks, numeric: true, render: (r) => num(r.walks) },
  { id: 'median', header: 'Median time', value: (r) => r.medianTimeS, numeric: true, render: (r) => <Text style={styles.num}>{duration(r.medianTimeS)}</Text> },
  { id: 'p90', header: '90th pct time', value: (r) => r.p90TimeS, numeric: true, render: (r) => <Text style={styles.num}>{duration(r.p90TimeS)}</Text> },
  { id: 'medianSteps', header: 'Median steps', value: (r) => r.medianSteps, numeric: true, render: (r) => <Text style={styles.num}>{steps(r.medianSteps)}</Text> },
  { id: 'p90Steps', header: '90th pct steps', value: (r) => r.p90Steps, numeric: true, render: (r) => <Text style={styles.num}>{steps(r.p90Steps)}</Text> },
];

export const weekColumns: TableColumn<WeekRow>[] = [
  { id: 'week', header: 'Week of', value: (r) => r.week, primary: true, render: (r) => <Text style={styles.strong}>{day(r.week)}</Text> },
  { id: 'finished', header: 'Finished', value: (r) => r.finished, numeric: true, render: (r) => num(r.finished) },
  { id: 'withCause', header: 'Cause found', value: (r) => r.withCause, numeric: true, render: (r) => num(r.withCause) },
  { id: 'unresolved', header: 'Referred or not fixed', value: (r) => r.referred + r.notFixed, numeric: true, render: (r) => num(r.referred + r.notFixed) },
  { id: 'cameBack', header: 'Came back', value: (r) => r.cameBack, numeric: true, render: (r) => num(r.cameBack) },
];

const styles = StyleSheet.create({
  section: { gap: space.md },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  headText: { flex: 1, gap: 2 },
  title: { ...type.heading, color: colors.ink },
  about: { ...type.small, color: colors.inkMuted },
  csv: { minHeight: touchTarget, minWidth: touchTarget, paddingHorizontal: space.md, textAlignVertical: 'center', lineHeight: touchTarget - 4, borderWidth: 2, borderColor: colors.accent, borderRadius: 10, fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark, textDecorationLine: 'none' },
  num: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  td: { ...type.small, fontSize: 15, color: colors.ink },
  strong: { fontFamily: fonts.bold, fontSize: 15, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  link: { fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark, textDecorationLine: 'underline', paddingVertical: space.md },
});
