import { StyleSheet, View } from 'react-native';
import type { IdleVacuumJudgement } from '@/shared/readings/vacuum-judgement';
import { formatNumber } from '@/shared/readings/errors';
import { ThemedText } from '@/components/themed-text';
import { colors, radius, space } from '@/components/theme';
import { VerdictBadge } from './verdict-badge';
import { RangeGauge } from './range-gauge';
import { Advice } from './advice';

/** The idle vacuum verdict: words and icon, the expected band as a bar with the reading on it, causes and checks. */
export function VacuumResult({ j }: { j: IdleVacuumJudgement }) {
  const { low, high, veryLowBelow, unit } = j.expected;
  const value = j.measured.value;
  const max = Math.max(high * 1.35, value * 1.1, high + 1e-6);
  const zones = [
    { from: 0, to: veryLowBelow, label: 'very low', tone: 'problem' as const },
    { from: veryLowBelow, to: low, label: 'low', tone: 'caution' as const },
    { from: low, to: high, label: 'expected', tone: 'ok' as const },
    { from: high, to: max, label: 'high', tone: 'caution' as const },
  ];
  const show = (v: number) => formatNumber(v, 3);
  return (
    <View style={styles.card} testID="vacuum-result">
      <ThemedText variant="heading" accessibilityRole="header">
        Idle vacuum
      </ThemedText>
      <VerdictBadge verdict={j.verdict} testID="vacuum-verdict" />
      <ThemedText testID="vacuum-summary">{j.summary}</ThemedText>
      <RangeGauge
        min={0}
        max={max}
        zones={zones}
        ticks={[
          { value: low, label: show(low) },
          { value: high, label: show(high) },
        ]}
        markers={[{ value, label: `${show(value)} ${unit}` }]}
        description={`Expected ${show(low)} to ${show(high)} ${unit}; measured ${show(value)} ${unit}.`}
        testID="vacuum-gauge"
      />
      <Advice causes={j.causes} nextChecks={j.nextChecks} cautions={j.cautions} testID="vacuum" />
    </View>
  );
}

export const resultCardStyle = { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md } as const;
const styles = StyleSheet.create({ card: resultCardStyle });
