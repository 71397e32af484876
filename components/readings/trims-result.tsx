import { StyleSheet, View } from 'react-native';
import type { FuelTrimJudgement } from '@/shared/readings/fuel-trim-judgement';
import { PATTERN_LABELS, signed } from '@/shared/readings/fuel-trim-judgement';
import { CODE_TRIM_LIMIT_PCT, NORMAL_TRIM_LIMIT_PCT } from '@/shared/readings/fuel-trim';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import { ThemedText } from '@/components/themed-text';
import { space } from '@/components/theme';
import { VerdictBadge } from './verdict-badge';
import { RangeGauge } from './range-gauge';
import { Advice } from './advice';
import { resultCardStyle } from './vacuum-result';

// The bar spans ±35 %: wide enough to show the ±25 % code lines; larger totals sit at the end.
const SPAN = 35;
const ZONES = [
  { from: -SPAN, to: -CODE_TRIM_LIMIT_PCT, label: 'code', tone: 'problem' as const },
  { from: -CODE_TRIM_LIMIT_PCT, to: -NORMAL_TRIM_LIMIT_PCT, label: 'rich', tone: 'caution' as const },
  { from: -NORMAL_TRIM_LIMIT_PCT, to: NORMAL_TRIM_LIMIT_PCT, label: 'normal', tone: 'ok' as const },
  { from: NORMAL_TRIM_LIMIT_PCT, to: CODE_TRIM_LIMIT_PCT, label: 'lean', tone: 'caution' as const },
  { from: CODE_TRIM_LIMIT_PCT, to: SPAN, label: 'code', tone: 'problem' as const },
];
const TICKS = [-CODE_TRIM_LIMIT_PCT, -NORMAL_TRIM_LIMIT_PCT, 0, NORMAL_TRIM_LIMIT_PCT, CODE_TRIM_LIMIT_PCT].map((v) => ({ value: v, label: v > 0 ? `+${v}` : String(v) }));

/** Fuel trims: the overall verdict and pattern, a bar per bank and speed with the total marked, causes and checks. */
export function TrimsResult({ j }: { j: FuelTrimJudgement }) {
  return (
    <View style={styles.card} testID="trims-result">
      <ThemedText variant="heading" accessibilityRole="header">
        Fuel trims
      </ThemedText>
      <VerdictBadge verdict={j.verdict} testID="trims-verdict" />
      <ThemedText testID="trims-summary">{j.summary}</ThemedText>
      {j.banks.flatMap((b) =>
        (['idle', 'at2500'] as const).map((speed) => {
          const p = b[speed];
          if (!p) return null;
          const where = speed === 'idle' ? 'idle' : '2 500 rpm';
          return (
            <View key={`${b.bank}-${speed}`} style={styles.point}>
              <ThemedText variant="label">
                {`Bank ${b.bank}, ${where}: short ${signed(p.shortPct)} + long ${signed(p.longPct)} = ${signed(p.totalPct)} · ${VERDICT_LABELS[p.verdict]}`}
              </ThemedText>
              <RangeGauge
                min={-SPAN}
                max={SPAN}
                zones={ZONES}
                ticks={TICKS}
                markers={[{ value: p.totalPct, label: signed(p.totalPct) }]}
                description={`Bank ${b.bank} at ${where}: total ${signed(p.totalPct)}; normal is within ±${NORMAL_TRIM_LIMIT_PCT} %.`}
                testID={`trim-gauge-${b.bank}-${speed}`}
              />
            </View>
          );
        }),
      )}
      {j.pattern !== 'normal' ? <ThemedText variant="subheading">{PATTERN_LABELS[j.pattern]}</ThemedText> : null}
      <Advice causes={j.causes} nextChecks={j.nextChecks} cautions={j.cautions} testID="trims" />
    </View>
  );
}

const styles = StyleSheet.create({ card: resultCardStyle, point: { gap: space.xs } });
