import { describe, expect, it } from 'vitest';
import { createActor } from 'xstate';
import { judgeReading } from '@/shared/readings/judge-reading';
import type { ReadingParams } from '@/shared/readings/reading-kinds';
import {
  TreeEngineError,
  applyEvent,
  availableAnswers,
  buildTreeMachine,
  parseTree,
  replayWalk,
  shortestToCause,
  stepKind,
  type WalkEvent,
} from './engine';
import type { TreeDoc } from './tree-format';
import { soundTree } from './fixtures/sound-tree';
import { DEFECTS } from './fixtures/defect-trees';
import { candidateValues, readingFor, verdictOf } from './fixtures/walk-helpers';

function sound(): TreeDoc {
  const parsed = parseTree(soundTree());
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.findings));
  return parsed.doc;
}
const doc = sound();
const trimParams = (doc.machine.states['read-trims'].meta as { reading: ReadingParams }).reading;
const pressureParams = (doc.machine.states['read-pressure'].meta as { reading: ReadingParams }).reading;
const toTrims: WalkEvent[] = [{ type: 'answer.sound' }];

describe('parseTree', () => {
  it('accepts the sound tree and refuses a broken one with the validator findings', () => {
    expect(parseTree(soundTree()).ok).toBe(true);
    const broken = parseTree(DEFECTS.find((d) => d.code === 'unknown_target')!.tree);
    expect(broken.ok).toBe(false);
    if (!broken.ok) expect(broken.findings.map((f) => f.code)).toContain('unknown_target');
  });
});

describe('stepping through a tree', () => {
  it('starts at the initial step and lists what each kind of step offers', () => {
    expect(replayWalk(doc, [])).toEqual({ stepId: 'look-hoses', final: false, path: ['look-hoses'] });
    expect(availableAnswers(doc, 'look-hoses')).toEqual([
      { event: 'answer.split', label: 'One is off or split', target: 'replace-hose' },
      { event: 'answer.sound', label: 'All on and whole', target: 'read-trims' },
    ]);
    expect(availableAnswers(doc, 'replace-hose')).toEqual([{ event: 'done', label: 'Hose refitted', target: 'read-trims' }]);
    const [reading] = availableAnswers(doc, 'read-trims');
    expect(reading.event).toBe('reading');
    expect(reading.branches).toEqual([
      { verdict: 'normal', target: 'trims-ok' },
      { verdict: 'lean', target: 'smoke-test' },
      { verdict: 'rich', target: 'refer-tune' },
      { verdict: 'code_lean', target: 'read-pressure' },
      { verdict: 'code_rich', target: 'refer-tune' },
    ]);
    expect(availableAnswers(doc, 'weak-pump')).toEqual([]);
    expect(() => availableAnswers(doc, 'no-such-step')).toThrow(TreeEngineError);
  });

  it('moves on an offered answer and records the path', () => {
    const r = applyEvent(doc, [], { type: 'answer.split' });
    expect(r).toEqual({ ok: true, stepId: 'replace-hose', final: false, path: ['look-hoses', 'replace-hose'] });
    const done = applyEvent(doc, [{ type: 'answer.split' }], { type: 'done' });
    expect(done).toMatchObject({ ok: true, stepId: 'read-trims' });
  });

  it('takes the branch for the verdict the readings check gives', () => {
    for (const value of [-40, -15, 0, 15, 40]) {
      const verdict = judgeReading(trimParams, { value }).verdict;
      const r = applyEvent(doc, toTrims, { type: 'reading', value });
      const target = availableAnswers(doc, 'read-trims')[0].branches!.find((b) => b.verdict === verdict)!.target;
      expect(r).toMatchObject({ ok: true, stepId: target, verdict });
      if (r.ok) expect(r.judgement?.summary).toBe(judgeReading(trimParams, { value }).summary);
    }
  });

  it('converts a reading typed in another pressure unit before judging it', () => {
    const events: WalkEvent[] = [...toTrims, readingFor(trimParams, 'code_lean', {})!];
    const inKpa = applyEvent(doc, events, { type: 'reading', value: 300, unit: 'kPa' });
    // 300 kPa is about 43.5 psi: the verdict is whatever the readings check says of it.
    const expected = judgeReading(pressureParams, { value: 300, unit: 'kPa' }).verdict;
    expect(inKpa).toMatchObject({ ok: true, verdict: expected });
  });

  it('passes the altitude to the readings check (vacuum depends on it)', () => {
    const tree = soundTree();
    (tree.machine.states['read-pressure'] as any).meta.reading = { kind: 'idle_vacuum' };
    (tree.machine.states['read-pressure'] as any).on.reading = [
      { guard: { type: 'verdict', params: { is: 'within_range' } }, target: 'intake-leak' },
      { guard: { type: 'verdict', params: { is: 'low' } }, target: 'weak-pump' },
      { guard: { type: 'verdict', params: { is: 'very_low' } }, target: 'weak-pump' },
      { guard: { type: 'verdict', params: { is: 'high' } }, target: 'refer-tune' },
    ];
    const parsed = parseTree(tree);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const vac: ReadingParams = { kind: 'idle_vacuum' };
    const sea = { altitudeM: 0 };
    const high = { altitudeM: 2500 };
    // A value the readings check judges differently at sea level and up high.
    const split = candidateValues(vac).find((v) => verdictOf(vac, v, sea) !== verdictOf(vac, v, high) && verdictOf(vac, v, high) !== 'refused');
    expect(split).toBeDefined();
    const events: WalkEvent[] = [...toTrims, readingFor(trimParams, 'code_lean', {})!];
    const atSea = applyEvent(parsed.doc, events, { type: 'reading', ...split! }, sea);
    const upHigh = applyEvent(parsed.doc, events, { type: 'reading', ...split! }, high);
    expect(atSea.ok && upHigh.ok && atSea.verdict !== upHigh.verdict).toBe(true);
  });
});

describe('refusals a technician can read', () => {
  it('refuses an answer the step does not offer, naming the ones it does', () => {
    const r = applyEvent(doc, [], { type: 'answer.maybe' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/“Are the vacuum hoses on and whole\?” does not offer that.*“One is off or split”, “All on and whole”/);
    expect(applyEvent(doc, [], { type: 'done' })).toMatchObject({ ok: false });
    expect(applyEvent(doc, [], { type: 'reading', value: 3 })).toMatchObject({ ok: false, reason: expect.stringMatching(/not a reading/) });
    expect(applyEvent(doc, toTrims, { type: 'answer.sound' })).toMatchObject({ ok: false, reason: expect.stringMatching(/a reading/) });
  });

  it('refuses malformed events without throwing', () => {
    for (const junk of [null, 'answer.sound', {}, { type: 42 }, { type: 'reading', value: 'twelve' }, { type: 'reading', value: Number.NaN }]) {
      const r = applyEvent(doc, toTrims, junk);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.reason.length).toBeGreaterThan(20);
    }
  });

  it('refuses an impossible reading with the readings check message', () => {
    const value = 500; // far outside what an engine computer can report
    let message = '';
    try {
      judgeReading(trimParams, { value });
    } catch (err) {
      message = (err as Error).message;
    }
    expect(message).not.toBe('');
    expect(applyEvent(doc, toTrims, { type: 'reading', value })).toEqual({ ok: false, reason: message });
    const wrongUnit = applyEvent(doc, [...toTrims, readingFor(trimParams, 'code_lean', {})!], { type: 'reading', value: 12, unit: 'volts' });
    expect(wrongUnit).toMatchObject({ ok: false, reason: expect.stringMatching(/psi/) });
  });

  it('refuses anything once the walk has ended', () => {
    const ended: WalkEvent[] = [...toTrims, readingFor(trimParams, 'normal', {})!];
    expect(replayWalk(doc, ended)).toMatchObject({ stepId: 'trims-ok', final: true });
    expect(applyEvent(doc, ended, { type: 'done' })).toMatchObject({ ok: false, reason: expect.stringMatching(/already ended/) });
  });

  it('throws a typed error naming the stored event that no longer fits', () => {
    try {
      replayWalk(doc, [{ type: 'answer.sound' }, { type: 'answer.sound' }]);
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(TreeEngineError);
      expect((err as TreeEngineError).code).toBe('event_refused');
      expect((err as TreeEngineError).eventIndex).toBe(1);
    }
  });
});

describe('the machine is a plain xstate machine', () => {
  it('steps live with an actor to the same place a replay reaches', () => {
    const events: WalkEvent[] = [{ type: 'answer.split' }, { type: 'done' }, readingFor(trimParams, 'lean', {})!, { type: 'answer.gasket' }, { type: 'done' }];
    const actor = createActor(buildTreeMachine(doc), { input: {} }).start();
    for (const e of events) actor.send(e);
    expect(actor.getSnapshot().value).toBe('read-trims');
    expect(replayWalk(doc, events).stepId).toBe('read-trims');
    expect(replayWalk(doc, events).path).toEqual(['look-hoses', 'replace-hose', 'read-trims', 'smoke-test', 'reseal-gasket', 'read-trims']);
  });
});

describe('distances and kinds', () => {
  it('counts answers to the nearest cause', () => {
    expect(shortestToCause(doc, 'look-hoses')).toBe(3);
    expect(shortestToCause(doc, 'read-pressure')).toBe(1);
    expect(shortestToCause(doc, 'intake-leak')).toBe(0);
    expect(shortestToCause(doc, 'trims-ok')).toBeNull();
    expect(stepKind(doc, 'read-trims')).toBe('reading');
    expect(stepKind(doc, 'refer-tune')).toBe('refer');
    expect(stepKind(doc, 'nope')).toBeUndefined();
  });
});
