/**
 * The tree engine: runs a tree document as an xstate v5 machine. Pure (no
 * React, no database): the same code answers in the browser and, with
 * authority, on the server. A walk is the list of its events; its position is
 * found by replaying them from the start with xstate's `transition`.
 * See trees/ENGINE.md.
 */
import { initialTransition, transition, type SnapshotFrom } from 'xstate';
import type { Verdict } from '@/shared/readings/reading-kinds';
import { VERDICTS } from '@/shared/readings/reading-kinds';
import { isReadingError } from '@/shared/readings/errors';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import type { StepKind, TreeDoc } from './tree-format';
import {
  TreeEngineError,
  walkEventSchema,
  type AvailableAnswer,
  type Finding,
  type ReadingEvent,
  type WalkContext,
  type WalkEvent,
  type WalkPosition,
} from './engine-types';
import { answersToNearestCause, edgesFrom } from './graph';
import { buildTreeMachine, judgeReadingEvent, type Judgement, type TreeMachine } from './machine';
import { validateTree } from './validate';

export { buildTreeMachine, type Judgement, type TreeMachine } from './machine';
export * from './engine-types';

/** Reads a stored or uploaded document: ok only when it matches the format and the validator finds no error. */
export function parseTree(json: unknown): { ok: true; doc: TreeDoc } | { ok: false; findings: Finding[] } {
  const { doc, findings } = validateTree(json);
  if (!doc || findings.some((f) => f.severity === 'error')) return { ok: false, findings: findings.filter((f) => f.severity === 'error') };
  return { ok: true, doc };
}

/** The kind of a step, or undefined when the tree has no such step. */
export function stepKind(doc: TreeDoc, stepId: string): StepKind | undefined {
  return doc.machine.states[stepId]?.meta.kind;
}

/** What a technician can do at a step; empty at a final step. */
export function availableAnswers(doc: TreeDoc, stepId: string): AvailableAnswer[] {
  const state = doc.machine.states[stepId];
  if (!state) throw new TreeEngineError('unknown_step', `This tree has no step "${stepId}".`);
  if (state.type === 'final') return [];
  const edges = edgesFrom(doc, stepId);
  if (state.meta.kind === 'reading') {
    const order: readonly string[] = VERDICTS[state.meta.reading.kind];
    const branches = edges
      .filter((e) => e.event === 'reading' && e.verdict)
      .map((e) => ({ verdict: e.verdict as Verdict, target: e.target }))
      .sort((a, b) => order.indexOf(a.verdict) - order.indexOf(b.verdict));
    return [{ event: 'reading', label: readingLabel(doc, stepId), branches }];
  }
  return edges.map((e) => ({ event: e.event, label: e.label ?? (e.event === 'done' ? 'Done, carry on' : e.event), target: e.target }));
}

/** Answers still needed from a step to the nearest cause step, or null when no cause can be reached. */
export function shortestToCause(doc: TreeDoc, stepId: string): number | null {
  return answersToNearestCause(doc, stepId);
}

// One machine per document object: building is cheap but walks replay often.
const machines = new WeakMap<TreeDoc, TreeMachine>();
function machineFor(doc: TreeDoc): TreeMachine {
  let m = machines.get(doc);
  if (!m) machines.set(doc, (m = buildTreeMachine(doc)));
  return m;
}

type Snapshot = SnapshotFrom<TreeMachine>;
type Step = { ok: true; snapshot: Snapshot; judgement?: Judgement } | { ok: false; reason: string };

/** Replays a walk's stored events from the start; throws TreeEngineError if one is refused. */
export function replayWalk(doc: TreeDoc, events: readonly WalkEvent[], ctx: WalkContext = {}): WalkPosition {
  const { snapshot, path } = replay(doc, events, ctx);
  return { stepId: stepOf(snapshot), final: snapshot.status === 'done', path };
}

/** Tries one more event after the stored ones: the next step, or a refusal a technician can read. */
export function applyEvent(
  doc: TreeDoc,
  events: readonly WalkEvent[],
  next: unknown,
  ctx: WalkContext = {},
):
  | { ok: true; stepId: string; final: boolean; path: string[]; verdict?: Verdict; judgement?: Judgement }
  | { ok: false; reason: string } {
  const { snapshot, path } = replay(doc, events, ctx);
  const result = step(doc, snapshot, next, ctx);
  if (!result.ok) return result;
  const stepId = stepOf(result.snapshot);
  return {
    ok: true,
    stepId,
    final: result.snapshot.status === 'done',
    path: [...path, stepId],
    ...(result.judgement ? { verdict: result.judgement.verdict as Verdict, judgement: result.judgement } : {}),
  };
}

function replay(doc: TreeDoc, events: readonly WalkEvent[], ctx: WalkContext) {
  const machine = machineFor(doc);
  let [snapshot] = initialTransition(machine, ctx);
  const path = [stepOf(snapshot)];
  events.forEach((event, i) => {
    const r = step(doc, snapshot, event, ctx);
    if (!r.ok) throw new TreeEngineError('event_refused', `Stored answer ${i + 1} no longer fits this tree: ${r.reason}`, i);
    snapshot = r.snapshot;
    path.push(stepOf(snapshot));
  });
  return { snapshot, path };
}

const stepOf = (snapshot: Snapshot) => String(snapshot.value);

/** Checks an event against the current step with plain words, then lets xstate take the transition. */
function step(doc: TreeDoc, snapshot: Snapshot, raw: unknown, ctx: WalkContext): Step {
  const stepId = stepOf(snapshot);
  const state = doc.machine.states[stepId];
  const title = `“${state.meta.title}”`;
  if (snapshot.status === 'done') return { ok: false, reason: `This walk already ended at ${title}. Start a new walk to look again.` };
  const parsed = walkEventSchema.safeParse(raw);
  if (!parsed.success) return { ok: false, reason: describeBadEvent(raw) };
  const event = parsed.data as WalkEvent;
  let judgement: Judgement | undefined;

  if (event.type === 'reading') {
    if (state.meta.kind !== 'reading') return { ok: false, reason: `${title} asks for ${offerWords(doc, stepId)}, not a reading.` };
    try {
      judgement = judgeReadingEvent(state.meta.reading, event as ReadingEvent, ctx);
    } catch (err) {
      if (isReadingError(err)) return { ok: false, reason: err.message };
      throw err;
    }
    const hasBranch = edgesFrom(doc, stepId).some((e) => e.event === 'reading' && e.verdict === judgement!.verdict);
    if (!hasBranch) {
      return { ok: false, reason: `The reading was judged “${VERDICT_LABELS[judgement.verdict]}”, but ${title} has no branch for that. Ask whoever keeps this tree to add one.` };
    }
  } else if (!state.on?.[event.type]) {
    return { ok: false, reason: `${title} does not offer that. It asks for ${offerWords(doc, stepId)}.` };
  }

  const machine = machineFor(doc);
  // xstate has the last word: the event must enable a transition from this snapshot.
  if (!snapshot.can(event)) return { ok: false, reason: `${title} cannot go on with that answer.` };
  const [next] = transition(machine, snapshot, event);
  return { ok: true, snapshot: next, judgement };
}

function offerWords(doc: TreeDoc, stepId: string): string {
  const answers = availableAnswers(doc, stepId);
  if (answers[0]?.event === 'reading') return 'a reading';
  if (answers.length === 1 && answers[0].event === 'done') return '“Done” once the work is finished';
  return `one of these answers: ${answers.map((a) => `“${a.label}”`).join(', ')}`;
}

function describeBadEvent(raw: unknown): string {
  const type = (raw as { type?: unknown } | null)?.type;
  if (type === 'reading') return 'Type the reading as a plain number (no letters), with its unit if the step asks for one.';
  return 'That is not an answer Baywalk understands. Choose one of the answers shown for this step.';
}

function readingLabel(doc: TreeDoc, stepId: string): string {
  const meta = doc.machine.states[stepId].meta;
  if (meta.kind !== 'reading') return meta.title;
  if (meta.reading.kind === 'range') return `${meta.reading.quantity} (${meta.reading.unit})`;
  if (meta.reading.kind === 'fuel_trim') return `Total fuel trim at ${meta.reading.rpm === 'idle' ? 'idle' : '2 500 rpm'} (%)`;
  return 'Manifold vacuum at idle';
}
