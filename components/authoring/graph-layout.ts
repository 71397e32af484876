/**
 * Lays a tree out as a top-to-bottom graph with dagre: one box per step,
 * one arrow per answer (answers to the same step from one step share an
 * arrow, their labels joined). Pure, so it runs in tests without a screen.
 */
import { Graph, layout } from '@dagrejs/dagre';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import type { Verdict } from '@/shared/readings/reading-kinds';
import { transitionsOf } from '@/trees/graph';
import type { StepKind, TreeDoc } from '@/trees/tree-format';

export const NODE_W = 200;
export const NODE_H = 72;

export interface GraphNode {
  id: string;
  kind: StepKind;
  title: string;
  /** Centre of the box. */
  x: number;
  y: number;
  initial: boolean;
}

export interface GraphEdge {
  from: string;
  to: string;
  label: string;
  points: Array<{ x: number; y: number }>;
  /** The target is not a step of the tree (shown dashed, with the missing id). */
  missing: boolean;
}

export interface GraphLayout {
  nodes: GraphNode[];
  edges: GraphEdge[];
  width: number;
  height: number;
}

const shorten = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s);

/** Positions for every step and answer of a (possibly unfinished) tree. */
export function layoutTree(doc: TreeDoc): GraphLayout {
  const g = new Graph({ multigraph: false });
  g.setGraph({ rankdir: 'TB', nodesep: 28, ranksep: 56, marginx: 16, marginy: 16 });
  g.setDefaultEdgeLabel(() => ({}));
  const states = doc.machine.states;
  for (const id of Object.keys(states)) g.setNode(id, { width: NODE_W, height: NODE_H });

  const labels = new Map<string, { from: string; to: string; words: string[] }>();
  for (const [from, state] of Object.entries(states)) {
    for (const { event, t } of transitionsOf(state)) {
      const to = typeof t?.target === 'string' && t.target ? t.target : '(no step)';
      const word = t.guard ? (VERDICT_LABELS[t.guard.params.is as Verdict] ?? t.guard.params.is) : event === 'done' ? 'Done' : (t.description ?? event);
      const key = `${from}\u0000${to}`;
      const entry = labels.get(key) ?? { from, to, words: [] };
      entry.words.push(word);
      labels.set(key, entry);
    }
  }
  for (const e of labels.values()) {
    if (!states[e.to]) g.setNode(`missing:${e.to}`, { width: 120, height: 36 });
    const label = shorten(e.words.join(' / '), 28);
    g.setEdge(e.from, states[e.to] ? e.to : `missing:${e.to}`, { label, width: Math.min(180, label.length * 7 + 8), height: 18, labelpos: 'c' });
  }
  layout(g);

  const nodes: GraphNode[] = Object.entries(states).map(([id, s]) => {
    const n = g.node(id);
    return { id, kind: s.meta.kind, title: s.meta.title, x: n.x, y: n.y, initial: id === doc.machine.initial };
  });
  const edges: GraphEdge[] = [...labels.values()].map((e) => {
    const target = states[e.to] ? e.to : `missing:${e.to}`;
    const edge = g.edge(e.from, target);
    return { from: e.from, to: e.to, label: edge.label as string, points: edge.points ?? [], missing: !states[e.to] };
  });
  const graph = g.graph();
  return { nodes, edges, width: Math.ceil(graph.width ?? 0), height: Math.ceil(graph.height ?? 0) };
}

/** Missing targets as boxes of their own (so a dangling answer has somewhere to point). */
export function missingBoxes(l: GraphLayout): Array<{ id: string; x: number; y: number }> {
  const seen = new Map<string, { x: number; y: number }>();
  for (const e of l.edges) if (e.missing && e.points.length) seen.set(e.to, e.points[e.points.length - 1]);
  return [...seen].map(([id, p]) => ({ id, ...p }));
}
