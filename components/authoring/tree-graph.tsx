import { useMemo } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import Svg, { Defs, G, Marker, Path, Polygon, Rect, Text as SvgText } from 'react-native-svg';
import { STEP_KIND_LABELS, type StepKind, type TreeDoc } from '@/trees/tree-format';
import type { Finding } from '@/trees/engine-types';
import { colors, fonts, space, type } from '@/components/theme';
import { NODE_H, NODE_W, layoutTree, missingBoxes, type GraphNode } from './graph-layout';

const KIND_STROKE: Record<StepKind, string> = {
  ask: colors.accentDark,
  reading: colors.accent,
  action: colors.ink,
  cause: colors.ok,
  refer: colors.inkMuted,
};

/** Words of a title cut into at most two lines that fit a box. */
function twoLines(title: string, max = 26): string[] {
  const words = (title || 'Untitled step').split(/\s+/);
  const lines = [''];
  for (const w of words) {
    const cur = lines[lines.length - 1];
    if ((cur + ' ' + w).trim().length <= max) lines[lines.length - 1] = (cur + ' ' + w).trim();
    else if (lines.length < 2) lines.push(w);
    else {
      lines[1] = `${lines[1].slice(0, max - 1)}…`;
      break;
    }
  }
  return lines.map((l) => (l.length > max ? `${l.slice(0, max - 1)}…` : l));
}

/** Each kind has its own outline, so kinds differ by shape and word as well as colour. */
function Shape({ n, selected }: { n: GraphNode; selected: boolean }) {
  const x = n.x - NODE_W / 2;
  const y = n.y - NODE_H / 2;
  const stroke = KIND_STROKE[n.kind];
  const common = { stroke, strokeWidth: selected ? 4 : 2, fill: selected ? colors.accentSoft : colors.surface };
  const w = NODE_W;
  const h = NODE_H;
  switch (n.kind) {
    case 'ask': // hexagon: a question
      return <Polygon points={`${x + 14},${y} ${x + w - 14},${y} ${x + w},${y + h / 2} ${x + w - 14},${y + h} ${x + 14},${y + h} ${x},${y + h / 2}`} {...common} />;
    case 'reading': // rounded ends: a gauge face
      return <Rect x={x} y={y} width={w} height={h} rx={h / 2} {...common} />;
    case 'action': // square corners with a heavy left edge: work to do
      return (
        <G>
          <Rect x={x} y={y} width={w} height={h} {...common} />
          <Rect x={x} y={y} width={8} height={h} fill={stroke} />
        </G>
      );
    case 'cause': // double outline: the end of the search
      return (
        <G>
          <Rect x={x} y={y} width={w} height={h} rx={6} {...common} />
          <Rect x={x + 5} y={y + 5} width={w - 10} height={h - 10} rx={4} fill="none" stroke={stroke} strokeWidth={1.5} />
        </G>
      );
    case 'refer': // a tag pointing away: handed over
      return <Polygon points={`${x},${y} ${x + w - 18},${y} ${x + w},${y + h / 2} ${x + w - 18},${y + h} ${x},${y + h}`} {...common} />;
  }
}

/** The draft as a graph (laid out by dagre): choosing a step opens it in the form. */
export function TreeGraph({ doc, selected, findings, onSelect }: { doc: TreeDoc; selected?: string; findings: Map<string, Finding[]>; onSelect: (id: string) => void }) {
  const l = useMemo(() => layoutTree(doc), [doc]);
  const missing = missingBoxes(l);
  return (
    <View style={styles.wrap} testID="tree-graph">
      <Text style={styles.legend}>
        Each kind has its own outline and its name on top: Ask is six-sided, Reading has round ends, Action has a heavy left edge, Cause a double edge, Refer points away. Tap a step to open it.
      </Text>
      <ScrollView horizontal contentContainerStyle={{ width: Math.max(l.width, 1) }}>
        <View style={{ width: l.width, height: l.height }}>
          <Svg width={l.width} height={l.height} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
            <Defs>
              <Marker id="arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="8" markerHeight="8" orient="auto">
                <Path d="M0,0 L10,5 L0,10 z" fill={colors.inkMuted} />
              </Marker>
            </Defs>
            {l.edges.map((e, i) => {
              const d = e.points.map((p, j) => `${j ? 'L' : 'M'}${p.x},${p.y}`).join(' ');
              const mid = e.points[Math.floor(e.points.length / 2)];
              return (
                <G key={i}>
                  <Path d={d} stroke={e.missing ? colors.danger : colors.inkMuted} strokeWidth={1.6} strokeDasharray={e.missing ? '6 4' : undefined} fill="none" markerEnd="url(#arrow)" />
                  {mid ? (
                    <G>
                      <Rect x={mid.x - e.label.length * 3.4 - 4} y={mid.y - 10} width={e.label.length * 6.8 + 8} height={18} rx={4} fill={colors.paper} />
                      <SvgText x={mid.x} y={mid.y + 4} fontSize={12} fontFamily={fonts.regular} fill={colors.ink} textAnchor="middle">
                        {e.label}
                      </SvgText>
                    </G>
                  ) : null}
                </G>
              );
            })}
            {missing.map((m) => (
              <SvgText key={m.id} x={m.x} y={m.y + 16} fontSize={12} fontFamily={fonts.semibold} fill={colors.danger} textAnchor="middle">
                {`✖ no step "${m.id}"`}
              </SvgText>
            ))}
            {l.nodes.map((n) => {
              const problem = (findings.get(n.id) ?? []).some((f) => f.severity === 'error');
              const lines = twoLines(n.title);
              return (
                <G key={n.id}>
                  <Shape n={n} selected={n.id === selected} />
                  <SvgText x={n.x} y={n.y - NODE_H / 2 + 20} fontSize={12} fontFamily={fonts.bold} fill={KIND_STROKE[n.kind]} textAnchor="middle">
                    {`${n.initial ? '▶ ' : ''}${STEP_KIND_LABELS[n.kind].toUpperCase()}${problem ? '  ✖ problem' : ''}`}
                  </SvgText>
                  {lines.map((line, i) => (
                    <SvgText key={i} x={n.x} y={n.y + 4 + i * 16} fontSize={13} fontFamily={fonts.semibold} fill={colors.ink} textAnchor="middle">
                      {line}
                    </SvgText>
                  ))}
                </G>
              );
            })}
          </Svg>
          {/* Pressable boxes over the drawing: they carry the touch targets and the accessible names. */}
          {l.nodes.map((n) => (
            <Pressable
              key={n.id}
              accessibilityRole="button"
              accessibilityLabel={`${STEP_KIND_LABELS[n.kind]} step: ${n.title || n.id}. Open`}
              onPress={() => onSelect(n.id)}
              style={[styles.hit, { left: n.x - NODE_W / 2, top: n.y - NODE_H / 2 }]}
              testID={`graph-node-${n.id}`}
            />
          ))}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  legend: { ...type.small, color: colors.inkMuted },
  hit: { position: 'absolute', width: NODE_W, height: NODE_H },
});
