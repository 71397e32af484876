import { ActivityIndicator, Modal, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { WALK_OUTCOME_LABELS } from '@/shared/schemas/walks';
import type { PatternWalk } from '@/shared/schemas/patterns';
import { usePatternDrill, type PatternDrillInput, type PatternFilterInput } from '@/hooks/use-patterns';
import { colors, fonts, maxContentWidth, radius, space, touchTarget, type } from '@/components/theme';
import { day, duration } from './format';
import { LoadError } from '@/components/load-error';

const OUTCOME_ICON = { fixed: '✔', not_fixed: '✖', referred: '➜' } as const;

/** The walks behind a number, in a sheet over the screen; each opens its walk page. */
export function DrillSheet({ filters, drill, onClose }: { filters: PatternFilterInput; drill: PatternDrillInput | null; onClose: () => void }) {
  const query = usePatternDrill(filters, drill);
  return (
    <Modal visible={drill !== null} transparent animationType="fade" onRequestClose={onClose}>
      <View style={styles.backdrop}>
        <View style={styles.sheet} testID="drill-sheet" role="dialog" aria-modal accessibilityLabel={drill?.label}>
          <View style={styles.head}>
            <Text style={styles.title} accessibilityRole="header" numberOfLines={3}>
              {drill?.label}
            </Text>
            <Pressable accessibilityRole="button" accessibilityLabel="Close the list" onPress={onClose} style={styles.close} testID="drill-close">
              <Text style={styles.closeText}>✕ Close</Text>
            </Pressable>
          </View>
          {query.isPending ? (
            <View style={styles.row} testID="drill-loading">
              <ActivityIndicator color={colors.accent} />
              <Text style={styles.muted}>Finding the walks…</Text>
            </View>
          ) : query.isError ? (
            <LoadError title="Could not load the walks" error={query.error} onRetry={query.refetch} busy={query.isFetching} />
          ) : (
            <ScrollView contentContainerStyle={styles.list} testID="drill-list">
              <Text style={styles.muted} testID="drill-count">
                {query.data.total === 1 ? '1 walk' : `${query.data.total} walks`}
                {query.data.total > query.data.items.length ? `, the newest ${query.data.items.length} shown (the CSV export has them all)` : ''}
              </Text>
              {query.data.items.map((w) => (
                <WalkItem key={w.id} walk={w} />
              ))}
            </ScrollView>
          )}
        </View>
      </View>
    </Modal>
  );
}

function WalkItem({ walk }: { walk: PatternWalk }) {
  return (
    <Link href={`/walks/${walk.id}`} asChild>
      <Pressable accessibilityRole="link" style={styles.item} testID={`drill-walk-${walk.id}`}>
        <Text style={styles.itemTitle}>
          {walk.roNumber} · {walk.vehicle || 'Vehicle'}
        </Text>
        <Text style={styles.itemLine}>{walk.treeTitle}</Text>
        <Text style={styles.itemLine}>
          {walk.outcome ? `${OUTCOME_ICON[walk.outcome]} ${WALK_OUTCOME_LABELS[walk.outcome]}` : 'Open'}
          {walk.causeText ? ` · ${walk.causeText}` : ''}
        </Text>
        <Text style={styles.muted}>
          {walk.finishedAt ? day(walk.finishedAt) : day(walk.startedAt)}
          {walk.techName ? ` · ${walk.techName}` : ''} · {walk.steps} steps{walk.timeSpentS !== null ? ` · ${duration(walk.timeSpentS)}` : ''}
        </Text>
        <Text style={styles.open}>Open the walk ›</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  backdrop: { flex: 1, backgroundColor: 'rgba(30, 42, 50, 0.45)', alignItems: 'center', justifyContent: 'flex-end' },
  sheet: { width: '100%', maxWidth: maxContentWidth, maxHeight: '88%', backgroundColor: colors.paper, borderTopLeftRadius: radius.lg, borderTopRightRadius: radius.lg, padding: space.lg, gap: space.md },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  title: { ...type.subheading, color: colors.ink, flex: 1 },
  close: { minHeight: touchTarget, minWidth: touchTarget, paddingHorizontal: space.md, borderRadius: 10, borderWidth: 2, borderColor: colors.accent, alignItems: 'center', justifyContent: 'center' },
  closeText: { fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  gap: { gap: space.md },
  list: { gap: space.sm, paddingBottom: space.lg },
  muted: { ...type.small, color: colors.inkMuted },
  item: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: 2, minHeight: touchTarget },
  itemTitle: { fontFamily: fonts.bold, fontSize: 16, color: colors.ink },
  itemLine: { ...type.small, fontSize: 15, color: colors.ink },
  open: { fontFamily: fonts.bold, fontSize: 15, color: colors.accentDark, marginTop: space.xs },
});
