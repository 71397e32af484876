import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import type { TreeStatsAnswer } from '@/shared/schemas/tree-authoring';
import { useTreeStats } from '@/hooks/use-tree-stats';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { StepKindBadge } from '@/components/trees/step-kind-badge';
import { STEP_KINDS, type StepKind } from '@/trees/tree-format';
import { colors, fonts, radius, space, type } from '@/components/theme';

const pct = (n: number, of: number) => (of ? `${Math.round((n / of) * 100)} %` : '—');
const num = (v: number | null, unit = '') => (v === null ? '—' : `${Number.isInteger(v) ? v : v.toFixed(1)}${unit}`);

/** Step statistics on the tree page: what the shop's finished walks did at each step, where they ended, how long it took. */
export function TreeStatsPanel({ treeId }: { treeId: number }) {
  const stats = useTreeStats(treeId);
  return (
    <View style={styles.col} testID="tree-stats">
      <ThemedText variant="heading" accessibilityRole="header">
        What walks did with this tree
      </ThemedText>
      {stats.isPending ? (
        <View style={styles.row}>
          <ActivityIndicator color={colors.accent} />
          <ThemedText muted>Counting walks…</ThemedText>
        </View>
      ) : stats.isError ? (
        <Notice tone="error" title="Could not count the walks">
          {stats.error.message}
        </Notice>
      ) : stats.data.walks.finished === 0 ? (
        <Notice tone="info" title="No finished walks yet" testID="tree-stats-empty">
          {stats.data.walks.open
            ? `${stats.data.walks.open} ${stats.data.walks.open === 1 ? 'walk is' : 'walks are'} still open. Figures appear here once walks are finished.`
            : 'Figures appear here once walks on this tree are finished.'}
        </Notice>
      ) : (
        <StatsBody s={stats.data} />
      )}
    </View>
  );
}

function StatsBody({ s }: { s: TreeStatsAnswer }) {
  const w = s.walks;
  // Steps nobody answered would be rows of zeros: count them instead of listing them.
  const reached = s.steps.filter((x) => x.total > 0);
  const unreached = s.steps.length - reached.length;
  return (
    <>
      <Text style={styles.muted}>From {w.finished} finished {w.finished === 1 ? 'walk' : 'walks'} of this shop, every version.</Text>
      <View style={styles.figures} testID="tree-stats-endings">
        <Figure value={`${w.toCause}`} label={`reached a cause (${pct(w.toCause, w.finished)})`} />
        <Figure value={`${w.toRefer}`} label={`ended at a refer step (${pct(w.toRefer, w.finished)})`} />
        <Figure value={`${w.unfinished}`} label={`closed before an end step (${pct(w.unfinished, w.finished)})`} />
        <Figure value={num(s.toCause.medianSteps)} label="median answers to a cause" />
        <Figure value={num(s.toCause.medianMinutes, ' min')} label="median minutes to a cause" />
        {w.open ? <Figure value={`${w.open}`} label="still open (not counted)" /> : null}
      </View>
      {s.causes.length ? (
        <View style={styles.col} testID="tree-stats-causes">
          <Text style={styles.sub}>Causes found</Text>
          {s.causes.map((c) => (
            <View key={c.stepId} style={styles.card} testID={`stats-cause-${c.stepId}`}>
              <Text style={styles.title}>{c.title}</Text>
              <Text style={styles.muted}>
                {c.count} {c.count === 1 ? 'walk' : 'walks'} ({pct(c.count, w.toCause)} of causes found) · median {num(c.medianSteps)} answers, {num(c.medianMinutes, ' min')}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
      <View style={styles.col} testID="tree-stats-steps">
        <Text style={styles.sub}>Answers taken at each step</Text>
        {unreached ? <Text style={styles.muted}>{unreached === 1 ? '1 step was' : `${unreached} steps were`} not answered in any finished walk.</Text> : null}
        {reached.map((step) => (
          <View key={step.stepId} style={styles.card} testID={`stats-step-${step.stepId}`}>
            <View style={styles.row}>
              {(STEP_KINDS as readonly string[]).includes(step.kind) ? <StepKindBadge kind={step.kind as StepKind} /> : null}
              <Text style={[styles.title, styles.grow]}>{step.title}</Text>
            </View>
            {step.options.map((o) => (
              <View key={o.key} style={styles.option}>
                <Text style={styles.optionText}>
                  {o.label}: <Text style={styles.count}>{o.count}</Text> ({pct(o.count, step.total)})
                </Text>
                <View style={styles.track} accessibilityElementsHidden>
                  <View style={[styles.bar, { width: `${step.total ? (o.count / step.total) * 100 : 0}%` }]} />
                </View>
              </View>
            ))}
          </View>
        ))}
      </View>
    </>
  );
}

function Figure({ value, label }: { value: string; label: string }) {
  return (
    <View style={styles.figure}>
      <Text style={styles.figureValue}>{value}</Text>
      <Text style={styles.muted}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  grow: { flex: 1 },
  muted: { ...type.small, color: colors.inkMuted },
  sub: { ...type.subheading, color: colors.ink },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  figure: { flexGrow: 1, flexBasis: 140, backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.md },
  figureValue: { fontFamily: fonts.bold, fontSize: 24, color: colors.ink },
  card: { gap: space.sm, backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.md },
  title: { ...type.label, color: colors.ink },
  option: { gap: 2 },
  optionText: { ...type.small, color: colors.ink },
  count: { fontFamily: fonts.bold },
  track: { height: 8, borderRadius: 4, backgroundColor: colors.paper, overflow: 'hidden' },
  bar: { height: 8, backgroundColor: colors.accent },
});
