import { StyleSheet, Text, View } from 'react-native';
import type { TreeStep } from '@/shared/schemas/trees';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { StepKindBadge } from './step-kind-badge';
import { CautionList } from './caution-list';

/** The tree's steps in the order a walk meets them, with kind, cautions and how far the nearest cause is. */
export function StepList({ steps }: { steps: TreeStep[] }) {
  return (
    <View style={styles.list} testID="tree-steps" role="list">
      {steps.map((s, i) => (
        <View key={s.id} style={styles.step} testID={`step-${s.id}`} role="listitem">
          <View style={styles.head}>
            <Text style={styles.number}>{i + 1}</Text>
            <StepKindBadge kind={s.kind} testID={`step-kind-${s.id}`} />
          </View>
          <Text style={styles.title}>{s.title}</Text>
          <CautionList cautions={s.cautions} testID={s.cautions.length ? `step-cautions-${s.id}` : undefined} />
          <Text style={styles.note}>{distanceWords(s)}</Text>
        </View>
      ))}
    </View>
  );
}

function distanceWords(s: TreeStep): string {
  if (s.kind === 'cause') return 'Ends the walk: a cause found.';
  if (s.kind === 'refer') return 'Ends the walk: hand over.';
  if (s.toCause === null) return 'No cause can be reached from here.';
  return `Nearest cause: ${s.toCause} ${s.toCause === 1 ? 'answer' : 'answers'} away.`;
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  step: { backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  number: { fontFamily: fonts.bold, fontSize: 15, color: colors.inkMuted, minWidth: 24 },
  title: { ...type.subheading, color: colors.ink },
  note: { ...type.small, color: colors.inkMuted },
});
