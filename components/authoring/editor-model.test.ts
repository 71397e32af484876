import { describe, expect, it } from 'vitest';
import { soundTree } from '@/trees/fixtures/sound-tree';
import { treeDocSchema } from '@/trees/tree-format';
import { validateTree } from '@/trees/validate';
import {
  addStep,
  answerEventFor,
  answersOf,
  branchesOf,
  deleteStep,
  duplicateStep,
  moveStep,
  referrers,
  renameStep,
  setKind,
  setStep,
  stepIdProblem,
  withAnswers,
  withReadingKind,
} from './editor-model';

const doc = () => treeDocSchema.parse(soundTree());
const ids = (d: ReturnType<typeof doc>) => Object.keys(d.machine.states);
const errors = (d: unknown) => validateTree(d).findings.filter((f) => f.severity === 'error');

describe('editor model', () => {
  it('adds a step after another, with a free id, and the checks say what it still needs', () => {
    const { doc: d, id } = addStep(doc(), 'cause', { afterId: 'look-hoses' });
    expect(id).toBe('new-cause');
    expect(ids(d)[1]).toBe('new-cause');
    expect(d.machine.states[id]).toMatchObject({ type: 'final', meta: { kind: 'cause', cause: { code: '', area: '', fix: '' } } });
    expect(addStep(d, 'cause').id).toBe('new-cause-2');
    // Unfinished: the schema names the missing title, code, area and fix of that step.
    const found = errors(d).filter((f) => f.stepId === id).map((f) => f.message);
    expect(found.some((m) => /title/.test(m))).toBe(true);
    expect(found.some((m) => /cause\.area/.test(m))).toBe(true);
  });

  it('lists the steps that point at a step, and deleting it leaves those answers for the author to re-aim', () => {
    const d = doc();
    expect(referrers(d, 'read-trims').map((r) => [r.stepId, r.answer])).toEqual([
      ['look-hoses', 'All on and whole'],
      ['replace-hose', 'Done'],
      ['reseal-gasket', 'Done'],
    ]);
    const after = deleteStep(d, 'read-trims');
    expect(ids(after)).not.toContain('read-trims');
    expect(errors(after).filter((f) => f.code === 'unknown_target').map((f) => f.stepId).sort()).toEqual(['look-hoses', 'replace-hose', 'reseal-gasket']);
    // Deleting the first step moves the start to the next one in the list.
    expect(deleteStep(d, 'look-hoses').machine.initial).toBe('replace-hose');
  });

  it('duplicates a step right after it and moves steps up and down', () => {
    const { doc: d, id } = duplicateStep(doc(), 'smoke-test');
    expect(id).toBe('smoke-test-copy');
    expect(ids(d)[ids(d).indexOf('smoke-test') + 1]).toBe(id);
    expect(d.machine.states[id].meta.title).toMatch(/\(copy\)$/);
    expect(d.machine.states[id].on).toEqual(d.machine.states['smoke-test'].on);
    const moved = moveStep(d, 'read-trims', -1);
    expect(ids(moved).indexOf('read-trims')).toBe(ids(d).indexOf('read-trims') - 1);
    expect(moveStep(moved, ids(moved)[0], -1)).toBe(moved);
  });

  it('renames a step and re-aims every answer and the start', () => {
    const d = renameStep(doc(), 'look-hoses', 'check-hoses');
    expect(d.machine.initial).toBe('check-hoses');
    expect(ids(d)[0]).toBe('check-hoses');
    const r = renameStep(d, 'read-trims', 'trims-at-idle');
    expect(referrers(r, 'trims-at-idle')).toHaveLength(3);
    expect(errors(r)).toEqual([]);
    expect(stepIdProblem(r, 'trims-at-idle', 'smoke-test')).toMatch(/already a step/);
    expect(stepIdProblem(r, 'trims-at-idle', 'Bad Id')).toMatch(/lower-case/);
  });

  it('edits answers with unique event names and keeps the tree valid', () => {
    const d = doc();
    const step = d.machine.states['look-hoses'];
    const event = answerEventFor(step, 'One is off or split');
    expect(event).toBe('answer.one-is-off-or-split');
    const rows = [...answersOf(step), { event, label: 'Cracked but on', target: 'replace-hose' }];
    const next = setStep(d, 'look-hoses', withAnswers(step, rows));
    expect(answersOf(next.machine.states['look-hoses'])).toHaveLength(3);
    expect(errors(next)).toEqual([]);
  });

  it('changes kinds and reading kinds, keeping what still applies', () => {
    const d = setKind(doc(), 'smoke-test', 'cause');
    expect(d.machine.states['smoke-test']).toMatchObject({ type: 'final', meta: { kind: 'cause', title: 'Smoke the intake: where does smoke come out?' } });
    expect(d.machine.states['smoke-test'].on).toBeUndefined();
    expect(d.machine.states['smoke-test'].meta.cautions).toHaveLength(1);

    const trims = doc().machine.states['read-trims'];
    const asRange = withReadingKind(trims, 'range');
    expect(branchesOf(asRange)).toEqual({}); // fuel-trim verdicts do not apply to a range reading
    const back = withReadingKind(asRange, 'fuel_trim');
    expect(back.meta).toMatchObject({ reading: { kind: 'fuel_trim', rpm: 'idle' } });
  });
});
