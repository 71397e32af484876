import { useEffect, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { useTreeHistory, useVersionDiff, type HistoryVersion } from '@/hooks/use-tree-drafts';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { SegmentedChoice } from '@/components/forms/segmented-choice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { DiffView } from './diff-view';

const STATE_WORDS = { draft: '✎ Draft', published: '✔ Published (walks start here)', retired: 'Superseded' } as const;
const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '—');

/** /trees/:id/history: every version with who, when and the note, and the difference between any two. */
export function HistoryView({ treeId }: { treeId: number }) {
  const history = useTreeHistory(treeId);
  const versions = history.data?.versions ?? [];
  const [from, setFrom] = useState<number>();
  const [to, setTo] = useState<number>();
  useEffect(() => {
    // Start by comparing the newest version with the one before it.
    if (versions.length >= 2 && from === undefined) {
      setTo(versions[0].id);
      setFrom(versions[1].id);
    }
  }, [versions, from]);
  const diff = useVersionDiff(treeId, from ?? 0, to ?? 0);
  const choices = versions.map((v) => ({ value: String(v.id), label: `v${v.version}${v.state === 'draft' ? ' (draft)' : ''}` }));

  return (
    <Screen testID="tree-history">
      <Link href={`/trees/${treeId}`} asChild>
        <Pressable accessibilityRole="link" style={styles.back} testID="history-back">
          <Text style={styles.backText}>‹ Back to the tree</Text>
        </Pressable>
      </Link>
      <ThemedText variant="title" accessibilityRole="header">
        History{history.data ? `: ${history.data.tree.title}` : ''}
      </ThemedText>
      {history.isPending ? (
        <ActivityIndicator color={colors.accent} />
      ) : history.isError ? (
        <Notice tone="error" title="Could not load the history">
          {history.error.message}
        </Notice>
      ) : (
        <>
          <View style={styles.col} testID="history-versions">
            {versions.map((v) => (
              <VersionRow key={v.id} v={v} />
            ))}
          </View>
          {versions.length >= 2 ? (
            <View style={styles.col}>
              <ThemedText variant="heading" accessibilityRole="header">
                Compare two versions
              </ThemedText>
              <SegmentedChoice label="Older version" options={choices} value={from ? String(from) : undefined} onChange={(v) => setFrom(Number(v))} testID="diff-from" />
              <SegmentedChoice label="Newer version" options={choices} value={to ? String(to) : undefined} onChange={(v) => setTo(Number(v))} testID="diff-to" />
              {diff.isPending && diff.fetchStatus !== 'idle' ? <ActivityIndicator color={colors.accent} /> : null}
              {diff.isError ? <Notice tone="error">{diff.error.message}</Notice> : null}
              {diff.data ? <DiffView diff={diff.data} /> : null}
            </View>
          ) : (
            <Notice tone="info">There is only one version so far, so nothing to compare yet.</Notice>
          )}
        </>
      )}
    </Screen>
  );
}

function VersionRow({ v }: { v: HistoryVersion }) {
  return (
    <View style={styles.card} testID={`history-version-${v.version}`}>
      <View style={styles.row}>
        <Text style={styles.version}>Version {v.version}</Text>
        <Text style={styles.state}>{STATE_WORDS[v.state]}</Text>
      </View>
      <Text style={styles.small}>
        Written by {v.authorName ?? 'former staff'}, {when(v.createdAt)}
        {v.state === 'draft' && v.updatedAt ? ` · last saved by ${v.updatedBy ?? v.authorName ?? 'former staff'}, ${when(v.updatedAt)}` : ''}
      </Text>
      {v.publishedAt ? (
        <Text style={styles.small}>
          Published {when(v.publishedAt)}
          {v.publishedBy ? ` by ${v.publishedBy}` : ''}
        </Text>
      ) : null}
      {v.note ? <Text style={styles.note}>“{v.note}”</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  back: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  backText: { fontFamily: fonts.semibold, fontSize: 17, color: colors.accentDark },
  col: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  card: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  version: { ...type.subheading, color: colors.ink },
  state: { fontFamily: fonts.semibold, fontSize: 15, color: colors.accentDark },
  small: { ...type.small, color: colors.inkMuted },
  note: { ...type.body, color: colors.ink },
});
