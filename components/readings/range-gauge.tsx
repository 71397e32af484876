import { useState } from 'react';
import { View } from 'react-native';
import Svg, { Line, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import { colors, fonts } from '@/components/theme';

export interface GaugeZone {
  from: number;
  to: number;
  label: string;
  tone: 'ok' | 'caution' | 'problem';
}

export interface GaugeMarker {
  value: number;
  label: string;
}

interface Props {
  min: number;
  max: number;
  zones: GaugeZone[];
  markers: GaugeMarker[];
  /** Values to print under the bar (the band's ends). */
  ticks: Array<{ value: number; label: string }>;
  /** What a screen reader says: the band and the measured value in words. */
  description: string;
  testID?: string;
}

const FILL = { ok: colors.okSoft, caution: colors.cautionSoft, problem: colors.dangerSoft } as const;
const EDGE = { ok: colors.ok, caution: colors.caution, problem: colors.danger } as const;
const BAR_Y = 30;
const BAR_H = 26;
const HEIGHT = 84;

/** A horizontal bar with the expected band and the measured value(s) marked; zone names are printed, not colour-coded only. */
export function RangeGauge({ min, max, zones, markers, ticks, description, testID }: Props) {
  const [width, setWidth] = useState(0);
  const pad = 16;
  const x = (v: number) => pad + ((Math.min(Math.max(v, min), max) - min) / (max - min || 1)) * (width - 2 * pad);
  return (
    <View onLayout={(e) => setWidth(e.nativeEvent.layout.width)} style={{ width: '100%', height: HEIGHT }} accessibilityRole="image" accessibilityLabel={description} testID={testID}>
      {width > 0 ? (
        <Svg width={width} height={HEIGHT}>
          {zones.map((z, i) => {
            const x0 = x(z.from);
            const w = Math.max(0, x(z.to) - x0);
            return (
              <Rect key={`z${i}`} x={x0} y={BAR_Y} width={w} height={BAR_H} fill={FILL[z.tone]} stroke={EDGE[z.tone]} strokeWidth={z.tone === 'ok' ? 2 : 1} />
            );
          })}
          {zones.map((z, i) => {
            const w = x(z.to) - x(z.from);
            return w > z.label.length * 6.2 + 4 ? (
              <SvgText key={`l${i}`} x={(x(z.from) + x(z.to)) / 2} y={BAR_Y + BAR_H / 2 + 4} fontSize={11} fontFamily={fonts.semibold} fill={colors.ink} textAnchor="middle">
                {z.label}
              </SvgText>
            ) : null;
          })}
          {ticks.map((t, i) => (
            <SvgText key={`t${i}`} x={x(t.value)} y={BAR_Y + BAR_H + 18} fontSize={12} fontFamily={fonts.regular} fill={colors.inkMuted} textAnchor="middle">
              {t.label}
            </SvgText>
          ))}
          {markers.map((m, i) => {
            const mx = x(m.value);
            const anchor = mx < 40 ? 'start' : mx > width - 40 ? 'end' : 'middle';
            return (
              <SvgText key={`mt${i}`} x={mx} y={13} fontSize={13} fontFamily={fonts.bold} fill={colors.ink} textAnchor={anchor}>
                {m.label}
              </SvgText>
            );
          })}
          {markers.map((m, i) => {
            const mx = x(m.value);
            return (
              <Polygon key={`mp${i}`} points={`${mx - 6},${BAR_Y - 12} ${mx + 6},${BAR_Y - 12} ${mx},${BAR_Y - 2}`} fill={colors.ink} />
            );
          })}
          {markers.map((m, i) => (
            <Line key={`ml${i}`} x1={x(m.value)} x2={x(m.value)} y1={BAR_Y - 2} y2={BAR_Y + BAR_H + 2} stroke={colors.ink} strokeWidth={3} />
          ))}
        </Svg>
      ) : null}
    </View>
  );
}
