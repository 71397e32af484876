import { StyleSheet, Text, View } from 'react-native';
import type { VersionDiff } from '@/shared/schemas/tree-authoring';
import { STEP_KINDS, type StepKind } from '@/trees/tree-format';
import { StepKindBadge } from '@/components/trees/step-kind-badge';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, type } from '@/components/theme';

type FieldChange = VersionDiff['tree'][number];

const CHANGE_WORDS = { added: '＋ Added', removed: '− Removed', changed: '✎ Changed' } as const;

/** The difference between two versions, step by step; changed texts line by line with + and − marks. */
export function DiffView({ diff }: { diff: VersionDiff }) {
  if (!diff.tree.length && !diff.steps.length) {
    return (
      <Notice tone="info" title="No differences" testID="diff-none">
        {`Versions ${diff.from.version} and ${diff.to.version} are the same.`}
      </Notice>
    );
  }
  return (
    <View style={styles.col} testID="diff-view">
      <Text style={styles.muted}>
        From version {diff.from.version} to version {diff.to.version}: {diff.steps.length} {diff.steps.length === 1 ? 'step' : 'steps'} differ, {diff.unchanged} unchanged.
      </Text>
      {diff.tree.length ? (
        <View style={styles.card} testID="diff-tree">
          <Text style={styles.title}>✎ The tree itself</Text>
          {diff.tree.map((f) => (
            <FieldLines key={f.field} f={f} />
          ))}
        </View>
      ) : null}
      {diff.steps.map((s) => (
        <View key={s.stepId} style={[styles.card, styles[s.change]]} testID={`diff-step-${s.stepId}`}>
          <View style={styles.row}>
            <Text style={styles.change}>{CHANGE_WORDS[s.change]}</Text>
            {(STEP_KINDS as readonly string[]).includes(s.kind) ? <StepKindBadge kind={s.kind as StepKind} /> : null}
          </View>
          <Text style={styles.title}>
            {s.title || 'Untitled step'} <Text style={styles.muted}>· {s.stepId}</Text>
          </Text>
          {s.fields.map((f) => (
            <FieldLines key={f.field} f={f} />
          ))}
        </View>
      ))}
    </View>
  );
}

function FieldLines({ f }: { f: FieldChange }) {
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{f.label}</Text>
      {f.lines.map((l, i) => (
        <Text key={i} style={[styles.line, l.op === 'added' && styles.lineAdded, l.op === 'removed' && styles.lineRemoved]} testID={l.op === 'same' ? undefined : `diff-line-${l.op}`}>
          {l.op === 'added' ? '+ ' : l.op === 'removed' ? '− ' : '  '}
          {l.text || ' '}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  col: { gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  muted: { ...type.small, color: colors.inkMuted },
  card: { gap: space.sm, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, borderLeftWidth: 5, backgroundColor: colors.surface },
  added: { borderLeftColor: colors.ok },
  removed: { borderLeftColor: colors.danger },
  changed: { borderLeftColor: colors.accent },
  change: { fontFamily: fonts.bold, fontSize: 15, color: colors.ink },
  title: { ...type.label, color: colors.ink },
  field: { gap: 2 },
  label: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted },
  line: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 20, color: colors.ink, paddingHorizontal: space.sm },
  lineAdded: { backgroundColor: colors.okSoft },
  lineRemoved: { backgroundColor: colors.dangerSoft, textDecorationLine: 'line-through' },
});
