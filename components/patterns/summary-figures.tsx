import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PatternReport } from '@/shared/schemas/patterns';
import type { PatternDrillInput } from '@/hooks/use-patterns';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import { percent } from './format';

interface Figure {
  key: string;
  value: string;
  label: string;
  drill?: PatternDrillInput;
}

/** The headline numbers for the period; a number with walks behind it opens them. */
export function SummaryFigures({ totals, windowDays, range, onDrill }: { totals: PatternReport['totals']; windowDays: number; range: string; onDrill: (d: PatternDrillInput) => void }) {
  const unresolved = totals.referred + totals.notFixed;
  const figures: Figure[] = [
    { key: 'finished', value: String(totals.finished), label: 'finished walks', drill: { measure: 'finished', label: `Finished walks, ${range}` } },
    { key: 'cause', value: percent(totals.finished ? totals.withCause / totals.finished : 0), label: `ended at a cause (${totals.withCause})` },
    { key: 'unresolved', value: String(unresolved), label: `referred (${totals.referred}) or not fixed (${totals.notFixed})`, drill: { measure: 'unresolved', label: `Referred or not fixed, ${range}` } },
    { key: 'comebacks', value: String(totals.cameBack), label: `fixed walks came back within ${windowDays} days (${percent(totals.fixed ? totals.cameBack / totals.fixed : 0)} of ${totals.fixed} fixed)` },
  ];
  return (
    <View style={styles.grid} testID="summary-figures">
      {figures.map((f) => {
        const body = (
          <>
            <Text style={styles.value} testID={`figure-${f.key}`}>
              {f.value}
            </Text>
            <Text style={styles.label}>{f.label}</Text>
            {f.drill ? <Text style={styles.more}>Show the walks ›</Text> : null}
          </>
        );
        return f.drill ? (
          <Pressable key={f.key} accessibilityRole="button" accessibilityLabel={`${f.value} ${f.label}. Show the walks`} onPress={() => onDrill(f.drill!)} style={styles.card} testID={`figure-card-${f.key}`}>
            {body}
          </Pressable>
        ) : (
          <View key={f.key} style={styles.card} testID={`figure-card-${f.key}`}>
            {body}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: { flexGrow: 1, flexBasis: 160, minHeight: touchTarget, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: 2 },
  value: { ...type.title, color: colors.ink },
  label: { ...type.small, color: colors.inkMuted },
  more: { fontFamily: fonts.bold, fontSize: 14, color: colors.accentDark, marginTop: space.xs },
});
