import { describe, expect, it } from 'vitest';
import { soundTree } from '@/trees/fixtures/sound-tree';
import { treeDocSchema } from '@/trees/tree-format';
import { layoutTree, NODE_H } from './graph-layout';

describe('layoutTree', () => {
  it('places every step once, the start on top, and draws an arrow per step pair', () => {
    const doc = treeDocSchema.parse(soundTree());
    const l = layoutTree(doc);
    expect(l.nodes.map((n) => n.id).sort()).toEqual(Object.keys(doc.machine.states).sort());
    const start = l.nodes.find((n) => n.initial)!;
    expect(start.id).toBe('look-hoses');
    for (const n of l.nodes) if (n !== start) expect(n.y).toBeGreaterThan(start.y);
    // read-trims sends "rich" and "code rich" to the same refer step: one arrow, both words.
    const rich = l.edges.filter((e) => e.from === 'read-trims' && e.to === 'refer-tune');
    expect(rich).toHaveLength(1);
    expect(rich[0].label).toMatch(/^Rich \/ Rich enough/);
    for (const e of l.edges) expect(e.points.length).toBeGreaterThanOrEqual(2);
    expect(l.width).toBeGreaterThan(0);
    expect(l.height).toBeGreaterThan(NODE_H * 3);
  });

  it('draws answers that lead nowhere to a box naming the missing step', () => {
    const doc = treeDocSchema.parse(soundTree());
    (doc.machine.states['replace-hose'].on!.done as { target: string }).target = 'gone-step';
    const l = layoutTree(doc);
    expect(l.edges.find((e) => e.from === 'replace-hose')).toMatchObject({ to: 'gone-step', missing: true });
  });
});
