import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createActor } from 'xstate';
import { applyEvent, availableAnswers, buildTreeMachine, parseTree, replayWalk, type WalkContext, type WalkEvent } from './engine';
import type { TreeDoc } from './tree-format';
import { distancesFrom, isFinal } from './graph';
import { soundTree } from './fixtures/sound-tree';
import { candidateValues, readingFor, stockLibrary, verdictOf } from './fixtures/walk-helpers';

const CONTEXTS: WalkContext[] = [{}, { altitudeM: 0 }, { altitudeM: 1100 }, { altitudeM: 2400 }, { baroKpa: 95 }];

const trees: Array<{ name: string; doc: TreeDoc }> = [
  { name: 'fixture tree', json: soundTree() as unknown },
  ...stockLibrary().map((t) => ({ name: t.file, json: t.json })),
].map(({ name, json }) => {
  const parsed = parseTree(json);
  if (!parsed.ok) throw new Error(`${name} does not parse: ${parsed.findings.map((f) => f.message).join(' ')}`);
  return { name, doc: parsed.doc };
});

/** Answers from each step to the nearest final step. */
function toFinal(doc: TreeDoc): Map<string, number> {
  const out = new Map<string, number>();
  for (const id of Object.keys(doc.machine.states)) {
    let best = Infinity;
    for (const [to, d] of distancesFrom(doc, id)) if (isFinal(doc.machine.states[to])) best = Math.min(best, d);
    out.set(id, best);
  }
  return out;
}

/** Every event name the tree uses anywhere, plus ones it never uses. */
function eventPool(doc: TreeDoc): WalkEvent[] {
  const names = new Set<string>(['done', 'answer.not-in-this-tree']);
  for (const s of Object.values(doc.machine.states)) for (const e of Object.keys(s.on ?? {})) names.add(e);
  return [...names].map((n) => (n === 'reading' ? { type: 'reading', value: 1 } : { type: n })) as WalkEvent[];
}

// What the walks did, so the harness can show it exercised refusals and readings, not just happy paths.
const seen = { junkRefused: 0, readingRefused: 0, readingsTaken: 0, finals: 0 };

const choiceArb = fc.record({ pick: fc.nat(), at: fc.double({ min: 0, max: 1, noNaN: true }), junk: fc.nat(), sendJunk: fc.boolean() });

describe.each(trees)('random walks through $name', ({ doc }) => {
  const cap = Math.max(60, 4 * Object.keys(doc.machine.states).length);
  const homeward = toFinal(doc);
  const pool = eventPool(doc);

  it('always end at a final step within the cap, refuse what a step does not offer, and replay to the same step', () => {
    fc.assert(
      fc.property(fc.array(choiceArb, { minLength: cap, maxLength: cap }), fc.constantFrom(...CONTEXTS), (choices, ctx) => {
        const events: WalkEvent[] = [];
        const actor = createActor(buildTreeMachine(doc), { input: ctx }).start();
        let stepId = doc.machine.initial;
        let final = false;
        for (let i = 0; i < cap && !final; i++) {
          const c = choices[i];
          const answers = availableAnswers(doc, stepId);
          const offered = new Set(answers.map((a) => a.event));

          // Something the step does not offer is refused and changes nothing.
          const notOffered = pool.filter((e) => !offered.has(e.type));
          if (c.sendJunk && notOffered.length > 0) {
            const junk = notOffered[c.junk % notOffered.length];
            const r = applyEvent(doc, events, junk, ctx);
            expect(r.ok, `${stepId} accepted ${junk.type}`).toBe(false);
            seen.junkRefused++;
          }

          const next = chooseEvent(doc, stepId, answers, c, ctx, i >= cap / 2, homeward);
          const r = applyEvent(doc, events, next.event, ctx);
          if (next.expect === 'refused') {
            expect(r.ok).toBe(false);
            seen.readingRefused++;
            continue;
          }
          if (next.event.type === 'reading') seen.readingsTaken++;
          expect(r.ok, JSON.stringify(r)).toBe(true);
          if (!r.ok) return;
          if (next.expect) expect(r.verdict).toBe(next.expect);
          events.push(next.event);
          actor.send(next.event);
          stepId = r.stepId;
          final = r.final;
          expect(String(actor.getSnapshot().value)).toBe(stepId);
        }
        expect(final, `walk of ${events.length} events stopped at ${stepId}`).toBe(true);
        seen.finals++;
        expect(actor.getSnapshot().status).toBe('done');
        const replayed = replayWalk(doc, events, ctx);
        expect(replayed.stepId).toBe(stepId);
        expect(replayed.final).toBe(true);
        expect(replayed.path).toHaveLength(events.length + 1);
        actor.stop();
      }),
      { numRuns: 100 },
    );
  });
});

type Choice = { pick: number; at: number };

/** A random offered answer, or (once `steer` is on) the one that heads for the nearest final step. */
function chooseEvent(
  doc: TreeDoc,
  stepId: string,
  answers: ReturnType<typeof availableAnswers>,
  c: Choice,
  ctx: WalkContext,
  steer: boolean,
  homeward: Map<string, number>,
): { event: WalkEvent; expect?: string } {
  const meta = doc.machine.states[stepId].meta;
  if (meta.kind !== 'reading') {
    const options = steer ? [...answers].sort((a, b) => homeward.get(a.target!)! - homeward.get(b.target!)!) : answers;
    const a = steer ? options[0] : options[c.pick % options.length];
    return { event: { type: a.event } as WalkEvent };
  }
  if (steer) {
    const branches = [...answers[0].branches!].sort((a, b) => homeward.get(a.target)! - homeward.get(b.target)!);
    for (const b of branches) {
      const e = readingFor(meta.reading, b.verdict, ctx);
      if (e) return { event: e, expect: b.verdict };
    }
  }
  const values = candidateValues(meta.reading);
  const v = values[Math.min(values.length - 1, Math.floor(c.at * values.length))];
  return { event: { type: 'reading', ...v }, expect: verdictOf(meta.reading, v, ctx) };
}

describe('the random-walk harness itself', () => {
  it('walks every tree it was given, the fixture included', () => {
    expect(trees.length).toBeGreaterThanOrEqual(1 + stockLibrary().length);
    expect(trees[0].name).toBe('fixture tree');
  });

  it('exercised refusals of unoffered events and impossible readings as well as readings taken', () => {
    expect(seen.finals).toBe(100 * trees.length);
    expect(seen.junkRefused).toBeGreaterThan(0);
    expect(seen.readingRefused).toBeGreaterThan(0);
    expect(seen.readingsTaken).toBeGreaterThan(0);
  });
});
