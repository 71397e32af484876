import { describe, expect, it } from 'vitest';
import { FINDING_CODES } from './engine-types';
import { validateTree } from './validate';
import { soundTree } from './fixtures/sound-tree';
import { DEFECTS } from './fixtures/defect-trees';

describe('validateTree on the sound fixture', () => {
  it('finds nothing wrong and computes the figures', () => {
    const { findings, stats } = validateTree(soundTree());
    expect(findings).toEqual([]);
    expect(stats.steps).toBe(10);
    // look-hoses → read-trims → read-pressure → weak-pump / intake-leak
    expect(stats.shortestToCause).toEqual({ 'weak-pump': 3, 'intake-leak': 3 });
    // look-hoses → replace-hose → read-trims → smoke-test → read-pressure → (cause): 5 answers
    expect(stats.longestPath).toBe(5);
  });

  it('answers anything that is not a tree with a finding, not a crash', () => {
    for (const junk of [null, 42, 'tree', [], {}, { machine: { states: 'x' } }]) {
      const { findings } = validateTree(junk);
      expect(findings.length).toBeGreaterThan(0);
      expect(findings.every((f) => f.code === 'schema' && f.message.length > 0)).toBe(true);
    }
  });
});

describe('validateTree catches each defect at the right step', () => {
  for (const d of DEFECTS) {
    it(`${d.code}: ${d.name}`, () => {
      const { findings } = validateTree(d.tree);
      const hit = findings.find((f) => f.code === d.code && f.stepId === d.stepId);
      expect(hit, JSON.stringify(findings, null, 1)).toBeDefined();
      expect(hit!.severity).toBe(d.severity);
      if (d.stepId) expect(hit!.message).toContain(`"${d.stepId}"`);
      for (const word of d.mentions ?? []) expect(hit!.message).toContain(word);
      // The message is a sentence for a person, not a code or a stack.
      expect(hit!.message).toMatch(/^[A-Z"].{20,}[.)]$/s);
    });
  }

  it('has a fixture for every finding code the validator can give', () => {
    const covered = new Set(DEFECTS.map((d) => d.code));
    expect(FINDING_CODES.filter((c) => !covered.has(c))).toEqual([]);
  });

  it('reports a tree with several defects all at once', () => {
    const tree = soundTree();
    const states = tree.machine.states as Record<string, any>;
    delete states['intake-leak'].type;
    states['look-hoses'].on['answer.split'].target = 'nowhere';
    const codes = validateTree(tree).findings.map((f) => f.code);
    expect(codes).toEqual(expect.arrayContaining(['not_final', 'unknown_target', 'unreachable']));
  });
});
