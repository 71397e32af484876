import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { WALK_OUTCOME_LABELS, type WalkSummary } from '@/shared/schemas/walks';
import { useJobWalks } from '@/hooks/use-walks';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { shortDate } from './job-vehicle';

/** The walks of a job, open ones first: continue an open walk, read the report of a finished one. */
export function JobWalks({ jobId }: { jobId: number }) {
  const walks = useJobWalks(jobId);
  if (walks.isPending) return <ActivityIndicator color={colors.accent} />;
  if (walks.isError) return <Notice tone="error" title="Could not load the walks">{walks.error.message}</Notice>;
  if (!walks.data.length) return <Text style={styles.muted}>No walks yet. Start one below.</Text>;
  const sorted = [...walks.data].sort((a, b) => Number(b.status === 'open') - Number(a.status === 'open'));
  return (
    <View style={styles.list} testID="job-walks">
      {sorted.map((w) => (
        <WalkRow key={w.id} walk={w} />
      ))}
    </View>
  );
}

function WalkRow({ walk }: { walk: WalkSummary }) {
  const open = walk.status === 'open';
  return (
    <Link href={open ? `/walks/${walk.id}` : `/walks/${walk.id}/report`} asChild>
      <Pressable accessibilityRole="link" testID={`job-walk-${walk.id}`} style={styles.row}>
        <Text style={[styles.status, open ? styles.open : styles.done]}>{open ? '● Open: continue ›' : `✔ ${walk.outcome ? WALK_OUTCOME_LABELS[walk.outcome] : 'Finished'}: report ›`}</Text>
        <Text style={styles.title}>{walk.tree.title}</Text>
        <Text style={styles.muted}>
          {walk.stepCount} {walk.stepCount === 1 ? 'answer' : 'answers'} · started {shortDate(walk.startedAt)}
          {walk.startedBy ? ` by ${walk.startedBy.name}` : ''}
          {walk.causeText ? ` · ${walk.causeText}` : ''}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { minHeight: touchTarget + 16, padding: space.md, gap: 2, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  status: { fontFamily: fonts.bold, fontSize: 15 },
  open: { color: colors.caution },
  done: { color: colors.ok },
  title: { ...type.subheading, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
});
