import { ActivityIndicator, Pressable, StyleSheet, Text, View, useWindowDimensions } from 'react-native';
import { Link } from 'expo-router';
import type { TreeDetail } from '@/shared/schemas/trees';
import { INSTALL_TYPE_LABELS, SYMPTOM_LABELS } from '@/trees/tree-format';
import { useTree } from '@/hooks/use-trees';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { colors, fonts, space, touchTarget, type, wideBreakpoint } from '@/components/theme';
import { StepList } from './step-list';
import { CauseList } from './cause-list';
import { TreeAuthoringBar } from '@/components/authoring/tree-authoring-bar';
import { TreeStatsPanel } from '@/components/authoring/tree-stats-panel';
import { LoadError } from '@/components/load-error';

/** One tree: what it is for, its published version, its steps in walk order and the causes it can reach. */
export function TreePage({ id }: { id: number }) {
  const tree = useTree(id);
  return (
    <Screen testID="tree-page">
      <Link href="/trees" asChild>
        <Pressable accessibilityRole="link" style={styles.back} testID="back-to-trees">
          <Text style={styles.backText}>‹ All trees</Text>
        </Pressable>
      </Link>
      {tree.isPending && tree.fetchStatus !== 'idle' ? (
        <View style={styles.row} testID="tree-loading">
          <ActivityIndicator color={colors.accent} />
          <ThemedText muted>Loading the tree…</ThemedText>
        </View>
      ) : tree.isError || !tree.data ? (
        <LoadError title="Could not open this tree" error={tree.error} missing="That tree was not found." onRetry={tree.refetch} busy={tree.isFetching} testID="tree-error" />
      ) : (
        <TreeBody detail={tree.data} />
      )}
    </Screen>
  );
}

function TreeBody({ detail }: { detail: TreeDetail }) {
  const { width } = useWindowDimensions();
  const wide = width >= wideBreakpoint;
  const { tree, version, stats } = detail;
  const shortest = stats ? Math.min(...Object.values(stats.shortestToCause)) : null;
  return (
    <>
      <View style={styles.col}>
        <ThemedText variant="title" accessibilityRole="header">
          {tree.title}
        </ThemedText>
        <Text style={styles.symptom}>{SYMPTOM_LABELS[tree.symptom]}</Text>
        <Text style={styles.muted}>After: {tree.installTypes.map((t) => INSTALL_TYPE_LABELS[t]).join(', ')}</Text>
        {tree.summary ? <ThemedText>{tree.summary}</ThemedText> : null}
        {version ? (
          <Text style={styles.muted} testID="tree-version">
            {`Version ${version.version}, published ${version.publishedAt ? new Date(version.publishedAt).toLocaleDateString() : '—'} · ${version.authorName ?? 'unknown author'}`}
          </Text>
        ) : null}
      </View>
      <TreeAuthoringBar detail={detail} />
      {!version || !stats ? (
        <Notice tone="info" title="Not published yet">
          This tree has no published version, so it cannot be walked yet.
        </Notice>
      ) : (
        <>
          <View style={styles.figures} testID="tree-figures">
            <Figure value={String(stats.steps)} label="steps" />
            <Figure value={String(detail.causes.length)} label={detail.causes.length === 1 ? 'cause it can find' : 'causes it can find'} />
            <Figure value={Number.isFinite(shortest) ? String(shortest) : '—'} label="answers to the nearest cause" />
            <Figure value={String(stats.longestPath)} label="answers on the longest walk" />
          </View>
          <View style={[styles.columns, wide && styles.columnsWide]}>
            <View style={[styles.col, wide && styles.mainCol]}>
              <ThemedText variant="heading" accessibilityRole="header">
                Steps in walk order
              </ThemedText>
              <StepList steps={detail.steps} />
            </View>
            <View style={[styles.col, wide && styles.sideCol]}>
              <CauseList causes={detail.causes} refers={detail.refers} />
            </View>
          </View>
          <TreeStatsPanel treeId={tree.id} />
        </>
      )}
    </>
  );
}

function Figure({ value, label }: { value: string; label: string }) {
  return (
    <View style={styles.figure}>
      <Text style={styles.figureValue}>{value}</Text>
      <Text style={styles.figureLabel}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  back: { minHeight: touchTarget, justifyContent: 'center', alignSelf: 'flex-start' },
  backText: { fontFamily: fonts.semibold, fontSize: 17, color: colors.accentDark },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  col: { gap: space.md },
  symptom: { ...type.subheading, color: colors.accentDark },
  muted: { ...type.small, color: colors.inkMuted },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  figure: { flexGrow: 1, flexBasis: 140, backgroundColor: colors.surface, borderRadius: 10, borderWidth: 1, borderColor: colors.line, padding: space.md },
  figureValue: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  figureLabel: { ...type.small, color: colors.inkMuted },
  columns: { gap: space.xl },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  mainCol: { flex: 3 },
  sideCol: { flex: 2 },
});
