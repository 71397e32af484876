import { Pressable, StyleSheet, Text, View } from 'react-native';
import Svg, { Rect } from 'react-native-svg';
import { scaleLinear } from 'd3-scale';
import { colors, fonts, space, touchTarget, type } from '@/components/theme';
import { useWidth } from './use-width';

export interface BarDatum {
  key: string;
  label: string;
  value: number;
  /** Words beside the value, e.g. "38 % of walks". */
  note?: string;
}

interface Props {
  data: readonly BarDatum[];
  /** What the chart shows, read out by screen readers. */
  title: string;
  onPress?: (d: BarDatum) => void;
  testID?: string;
}

const BAR_H = 14;

/**
 * Horizontal bars that fit the width they are given: each row is the label,
 * then the bar and its value (so long cause names wrap on a phone instead of
 * squeezing the bars). Bars scale with d3-scale; a row can be pressed.
 */
export function BarChart({ data, title, onPress, testID }: Props) {
  const [width, onLayout] = useWidth();
  const max = Math.max(1, ...data.map((d) => d.value));
  const valueRoom = 56;
  const x = scaleLinear().domain([0, max]).range([0, Math.max(0, width - valueRoom)]);
  return (
    <View onLayout={onLayout} style={styles.wrap} accessibilityLabel={title} testID={testID}>
      {width > 0
        ? data.map((d) => (
            <Pressable
              key={d.key}
              accessibilityRole={onPress ? 'button' : undefined}
              accessibilityLabel={`${d.label}: ${d.value}${d.note ? `, ${d.note}` : ''}`}
              onPress={onPress ? () => onPress(d) : undefined}
              style={styles.row}
              testID={testID ? `${testID}-${d.key}` : undefined}
            >
              <Text style={styles.label} numberOfLines={2}>
                {d.label}
                {d.note ? <Text style={styles.note}> · {d.note}</Text> : null}
              </Text>
              <View style={styles.barLine}>
                <Svg width={Math.max(2, x(d.value))} height={BAR_H} accessibilityElementsHidden importantForAccessibility="no">
                  <Rect x={0} y={0} width={Math.max(2, x(d.value))} height={BAR_H} rx={3} fill={colors.accent} />
                </Svg>
                <Text style={styles.value}>{d.value}</Text>
              </View>
            </Pressable>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', gap: space.xs },
  row: { minHeight: touchTarget, justifyContent: 'center', paddingVertical: space.xs, gap: 2 },
  label: { ...type.small, fontFamily: fonts.semibold, color: colors.ink },
  barLine: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  value: { fontFamily: fonts.bold, fontSize: 15, color: colors.ink },
  note: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkMuted },
});
