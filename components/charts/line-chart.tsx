import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { scaleLinear, scalePoint } from 'd3-scale';
import { line } from 'd3-shape';
import { colors, fonts, space, type } from '@/components/theme';
import { useWidth } from './use-width';

export interface LineSeries {
  key: string;
  label: string;
  values: readonly number[];
  color: string;
  /** Dash pattern and marker shape tell the lines apart without colour. */
  dash?: string;
  marker: 'circle' | 'square' | 'none';
}

interface Props {
  /** One label per point on the x axis (a week's Monday, say). */
  xLabels: readonly string[];
  series: readonly LineSeries[];
  title: string;
  height?: number;
  testID?: string;
}

const PAD = { top: 12, right: 12, bottom: 28, left: 34 };

/** A trend chart: lines drawn with d3-shape on d3 scales, fitted to the width it is given, with a legend in words. */
export function LineChart({ xLabels, series, title, height = 220, testID }: Props) {
  const [width, onLayout] = useWidth();
  const innerW = Math.max(0, width - PAD.left - PAD.right);
  const innerH = height - PAD.top - PAD.bottom;
  const max = Math.max(1, ...series.flatMap((s) => s.values));
  const x = scalePoint<number>().domain(xLabels.map((_, i) => i)).range([0, innerW]);
  const y = scaleLinear().domain([0, max]).nice(4).range([innerH, 0]);
  const ticks = y.ticks(4);
  // Room for about one label per 56 px.
  const every = Math.max(1, Math.ceil(xLabels.length / Math.max(1, Math.floor(innerW / 56))));
  const path = line<number>()
    .x((_, i) => x(i) ?? 0)
    .y((v) => y(v));
  const summary = `${title}. ${series.map((s) => `${s.label}: ${s.values.reduce((a, b) => a + b, 0)} in all`).join('; ')}.`;

  return (
    <View onLayout={onLayout} style={styles.wrap} testID={testID}>
      {width > 0 ? (
        <Svg width={width} height={height} accessibilityLabel={summary} role="img">
          <G x={PAD.left} y={PAD.top}>
            {ticks.map((t) => (
              <G key={t}>
                <Line x1={0} x2={innerW} y1={y(t)} y2={y(t)} stroke={colors.line} strokeWidth={1} />
                <SvgText x={-6} y={y(t) + 4} fontSize={12} fill={colors.inkMuted} textAnchor="end" fontFamily={fonts.regular}>
                  {String(t)}
                </SvgText>
              </G>
            ))}
            {xLabels.map((label, i) =>
              i % every === 0 ? (
                <SvgText key={label} x={x(i) ?? 0} y={innerH + 18} fontSize={12} fill={colors.inkMuted} textAnchor="middle" fontFamily={fonts.regular}>
                  {label}
                </SvgText>
              ) : null,
            )}
            {series.map((s) => (
              <G key={s.key}>
                <Path d={path([...s.values]) ?? ''} stroke={s.color} strokeWidth={2.5} strokeDasharray={s.dash} fill="none" />
                {s.marker !== 'none' && xLabels.length <= 60
                  ? s.values.map((v, i) =>
                      s.marker === 'circle' ? (
                        <Circle key={i} cx={x(i) ?? 0} cy={y(v)} r={3} fill={colors.surface} stroke={s.color} strokeWidth={2} />
                      ) : (
                        <Rect key={i} x={(x(i) ?? 0) - 3} y={y(v) - 3} width={6} height={6} fill={s.color} />
                      ),
                    )
                  : null}
              </G>
            ))}
          </G>
        </Svg>
      ) : (
        <View style={{ height }} />
      )}
      <View style={styles.legend} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
        {series.map((s) => (
          <View key={s.key} style={styles.legendItem}>
            <Svg width={30} height={12}>
              <Line x1={2} x2={28} y1={6} y2={6} stroke={s.color} strokeWidth={2.5} strokeDasharray={s.dash} />
              {s.marker === 'circle' ? <Circle cx={15} cy={6} r={3} fill={colors.surface} stroke={s.color} strokeWidth={2} /> : null}
              {s.marker === 'square' ? <Rect x={12} y={3} width={6} height={6} fill={s.color} /> : null}
            </Svg>
            <Text style={styles.legendText}>{s.label}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', gap: space.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  legendText: { ...type.small, color: colors.ink },
});
