import { StyleSheet, Text, View } from 'react-native';
import type { WalkDetail } from '@/shared/schemas/walks';
import { answerWords } from '@/shared/walk-report';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import type { Verdict } from '@/shared/readings/reading-kinds';
import { colors, fonts, radius, space, type } from '@/components/theme';

/** Every record of the walk in order, undone answers struck through and the undos shown (history is never rewritten). */
export function WalkHistory({ walk }: { walk: WalkDetail }) {
  if (!walk.history.length) return null;
  return (
    <View style={styles.list} testID="walk-history">
      {walk.history.map((h) => {
        const title = walk.doc.machine.states[h.fromStep]?.meta.title ?? h.fromStep;
        if (h.kind === 'undo') {
          return (
            <Text key={h.id} style={styles.undo}>
              ↶ Went back from “{walk.doc.machine.states[h.fromStep]?.meta.title ?? h.fromStep}”{h.by ? ` (${h.by.name})` : ''}
            </Text>
          );
        }
        return (
          <View key={h.id} style={[styles.item, h.undone && styles.undone]} testID={`history-${h.seq}`}>
            <Text style={[styles.title, h.undone && styles.struck]}>
              {h.seq}. {title}
            </Text>
            <Text style={[styles.answer, h.undone && styles.struck]}>
              {answerWords(walk.doc, h)}
              {h.verdict ? ` · ${VERDICT_LABELS[h.verdict as Verdict] ?? h.verdict}` : ''}
              {h.undone ? ' (taken back)' : ''}
            </Text>
            {h.note ? <Text style={styles.note}>Note: {h.note}</Text> : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { padding: space.md, borderRadius: radius.sm, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, gap: 2 },
  undone: { backgroundColor: colors.paper },
  title: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  answer: { ...type.small, color: colors.ink },
  struck: { textDecorationLine: 'line-through', color: colors.inkMuted },
  note: { ...type.small, color: colors.inkMuted },
  undo: { ...type.small, fontFamily: fonts.semibold, color: colors.inkMuted, paddingHorizontal: space.md },
});
