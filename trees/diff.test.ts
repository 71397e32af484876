import { describe, expect, it } from 'vitest';
import { diffTrees, lineDiff } from './diff';
import type { TreeDoc } from './tree-format';
import { soundTree } from './fixtures/sound-tree';

const doc = () => soundTree() as unknown as TreeDoc;

describe('lineDiff', () => {
  it('keeps common lines and marks the rest removed or added', () => {
    expect(lineDiff('a\nb\nc', 'a\nx\nc')).toEqual([
      { op: 'same', text: 'a' },
      { op: 'removed', text: 'b' },
      { op: 'added', text: 'x' },
      { op: 'same', text: 'c' },
    ]);
  });

  it('finds the longest common run when lines move', () => {
    const d = lineDiff('one\ntwo\nthree\nfour', 'two\nthree\nfour\none');
    expect(d.filter((c) => c.op === 'same').map((c) => c.text)).toEqual(['two', 'three', 'four']);
    expect(d.filter((c) => c.op !== 'same')).toEqual([
      { op: 'removed', text: 'one' },
      { op: 'added', text: 'one' },
    ]);
  });

  it('handles empty sides and identical texts', () => {
    expect(lineDiff('', 'a\nb')).toEqual([
      { op: 'added', text: 'a' },
      { op: 'added', text: 'b' },
    ]);
    expect(lineDiff('a', '')).toEqual([{ op: 'removed', text: 'a' }]);
    expect(lineDiff('same\ntext', 'same\ntext').every((c) => c.op === 'same')).toBe(true);
  });

  it('rebuilds both texts from its output', () => {
    const before = 'w\nx\ny\nz\nx\nw';
    const after = 'x\nw\ny\nq\nz\nw';
    const d = lineDiff(before, after);
    expect(d.filter((c) => c.op !== 'added').map((c) => c.text).join('\n')).toBe(before);
    expect(d.filter((c) => c.op !== 'removed').map((c) => c.text).join('\n')).toBe(after);
    // LCS of the two is 4 lines long (x, y, z, w).
    expect(d.filter((c) => c.op === 'same')).toHaveLength(4);
  });
});

describe('diffTrees', () => {
  it('finds nothing between a tree and its copy', () => {
    const d = diffTrees(doc(), doc());
    expect(d.tree).toEqual([]);
    expect(d.steps).toEqual([]);
    expect(d.unchanged).toBe(Object.keys(doc().machine.states).length);
  });

  it('names added, removed and changed steps, with a line difference for a changed body', () => {
    const before = doc();
    const after = doc();
    (before.machine.states['look-hoses'].meta as { body: string }).body = 'Engine off.\nLook at every hose.\nFeel for cracks.';
    (after.machine.states['look-hoses'].meta as { body: string }).body = 'Engine off and cool.\nLook at every hose.\nFeel for cracks.';
    after.machine.states['look-hoses'].on!['answer.cracked'] = { target: 'new-cause', description: 'Cracked but on' };
    after.machine.states['new-cause'] = {
      type: 'final',
      meta: { kind: 'cause', title: 'Cracked hose', body: '', cautions: [], photoPrompts: [], cause: { code: 'cracked-hose', area: 'Vacuum hose', fix: 'Replace it.' } },
    };
    delete after.machine.states['weak-pump'];
    after.title = 'Renamed';

    const d = diffTrees(before, after);
    expect(d.tree.map((f) => [f.field, f.after])).toEqual([['title', 'Renamed']]);
    const by = Object.fromEntries(d.steps.map((s) => [s.stepId, s]));
    expect(by['new-cause'].change).toBe('added');
    expect(by['new-cause'].fields.find((f) => f.field === 'cause.code')?.after).toBe('cracked-hose');
    expect(by['weak-pump'].change).toBe('removed');
    expect(by['look-hoses'].change).toBe('changed');
    const body = by['look-hoses'].fields.find((f) => f.field === 'body')!;
    expect(body.lines).toEqual([
      { op: 'removed', text: 'Engine off.' },
      { op: 'added', text: 'Engine off and cool.' },
      { op: 'same', text: 'Look at every hose.' },
      { op: 'same', text: 'Feel for cracks.' },
    ]);
    const answers = by['look-hoses'].fields.find((f) => f.field === 'answers')!;
    expect(answers.lines.filter((l) => l.op === 'added').map((l) => l.text)).toEqual(['Cracked but on → new-cause']);
    // Removed steps are listed after the steps of the newer version.
    expect(d.steps.at(-1)!.stepId).toBe('weak-pump');
  });

  it('reports a changed verdict branch and reading parameters', () => {
    const before = doc();
    const after = doc();
    const branches = after.machine.states['read-pressure'].on!.reading as Array<{ target: string }>;
    branches[0].target = 'intake-leak';
    (after.machine.states['read-pressure'].meta as { reading: { min: number } }).reading.min = 45;
    const step = diffTrees(before, after).steps.find((s) => s.stepId === 'read-pressure')!;
    expect(step.fields.map((f) => f.field).sort()).toEqual(['answers', 'reading']);
    expect(step.fields.find((f) => f.field === 'answers')!.lines.filter((l) => l.op !== 'same')).toEqual([
      { op: 'removed', text: 'when below → weak-pump' },
      { op: 'added', text: 'when below → intake-leak' },
    ]);
  });

  it('copes with drafts that are not valid trees', () => {
    const broken = { machine: { states: { odd: { meta: { kind: 'ask' }, on: { 'answer.x': 5 } } } } } as unknown as TreeDoc;
    const d = diffTrees(undefined, broken);
    expect(d.steps.map((s) => [s.stepId, s.change])).toEqual([['odd', 'added']]);
  });
});
