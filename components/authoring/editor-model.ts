/**
 * The editor's changes to a draft document, as pure functions that return a
 * new document. Steps keep their document order (the order of `states`),
 * which is the order the step list shows. A draft may be incomplete while
 * being written; the validator says what is still missing.
 */
import { VERDICTS, type ReadingKind, type ReadingParams } from '@/shared/readings/reading-kinds';
import type { StateDef, StepKind, StepMeta, TransitionDef, TreeDoc } from '@/trees/tree-format';
import { transitionsOf } from '@/trees/graph';

export type Doc = TreeDoc;
type States = Record<string, StateDef>;

const STEP_ID = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

/** Lower-case words joined by hyphens, from any text ("Hose off?" → "hose-off"). */
export function slugify(text: string, fallback = 'step'): string {
  const s = text
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 48)
    .replace(/-+$/, '');
  return s || fallback;
}

/** `base`, or `base-2`, `base-3`… whichever is not taken. */
export function freeName(base: string, taken: (name: string) => boolean): string {
  if (!taken(base)) return base;
  for (let n = 2; ; n++) if (!taken(`${base}-${n}`)) return `${base}-${n}`;
}

const withStates = (doc: Doc, states: States): Doc => ({ ...doc, machine: { ...doc.machine, states } });

/** Default reading parameters for a kind. */
export function defaultReading(kind: ReadingKind): ReadingParams {
  if (kind === 'fuel_trim') return { kind, rpm: 'idle' };
  if (kind === 'idle_vacuum') return { kind };
  return { kind: 'range', quantity: '', unit: '', min: 0, max: 0 };
}

/** A step of a kind, keeping the shared fields (title, body, cautions, photo prompts) of `from`. */
export function stepOfKind(kind: StepKind, from?: StateDef): StateDef {
  const m = from?.meta;
  const base = { title: m?.title ?? '', body: m?.body ?? '', cautions: m?.cautions ?? [], photoPrompts: m?.photoPrompts ?? [] };
  const keepOn = from && from.meta.kind === kind ? from.on : undefined;
  switch (kind) {
    case 'ask':
      return { meta: { kind, ...base }, on: keepOn ?? {} };
    case 'action':
      return { meta: { kind, ...base }, on: keepOn ?? {} };
    case 'reading': {
      const reading = m?.kind === 'reading' ? m.reading : defaultReading('fuel_trim');
      return { meta: { kind, ...base, reading }, on: keepOn ?? {} };
    }
    case 'cause':
      return { type: 'final', meta: { kind, ...base, cause: m?.kind === 'cause' ? m.cause : { code: '', area: '', fix: '' } } };
    case 'refer':
      return { type: 'final', meta: { kind, ...base, refer: m?.kind === 'refer' ? m.refer : { to: '', reason: '' } } };
  }
}

/** Adds a new step of a kind after `afterId` (or at the end); answers its id too. */
export function addStep(doc: Doc, kind: StepKind, opts: { afterId?: string; title?: string } = {}): { doc: Doc; id: string } {
  const states = doc.machine.states;
  const id = freeName(slugify(opts.title ?? '', `new-${kind}`), (n) => n in states);
  const step = stepOfKind(kind);
  step.meta = { ...step.meta, title: opts.title ?? '' } as StepMeta;
  const entries = Object.entries(states);
  const at = opts.afterId ? entries.findIndex(([k]) => k === opts.afterId) + 1 : entries.length;
  entries.splice(at > 0 ? at : entries.length, 0, [id, step]);
  return { doc: withStates(doc, Object.fromEntries(entries)), id };
}

/** A copy of a step right after it, titled "(copy)", with the same answers. */
export function duplicateStep(doc: Doc, id: string): { doc: Doc; id: string } {
  const states = doc.machine.states;
  const copyId = freeName(`${id}-copy`.slice(0, 60), (n) => n in states);
  const copy = structuredClone(states[id]);
  copy.meta = { ...copy.meta, title: `${copy.meta.title} (copy)` };
  const entries = Object.entries(states);
  entries.splice(entries.findIndex(([k]) => k === id) + 1, 0, [copyId, copy]);
  return { doc: withStates(doc, Object.fromEntries(entries)), id: copyId };
}

/** Moves a step up (-1) or down (+1) in the list. */
export function moveStep(doc: Doc, id: string, delta: -1 | 1): Doc {
  const entries = Object.entries(doc.machine.states);
  const i = entries.findIndex(([k]) => k === id);
  const j = i + delta;
  if (i < 0 || j < 0 || j >= entries.length) return doc;
  [entries[i], entries[j]] = [entries[j], entries[i]];
  return withStates(doc, Object.fromEntries(entries));
}

/** Steps with an answer or branch leading to `id`, with the words of that answer. */
export function referrers(doc: Doc, id: string): Array<{ stepId: string; title: string; answer: string }> {
  const out: Array<{ stepId: string; title: string; answer: string }> = [];
  for (const [from, state] of Object.entries(doc.machine.states)) {
    if (from === id) continue;
    for (const { event, t } of transitionsOf(state)) {
      if (t.target !== id) continue;
      const answer = t.guard ? `when ${t.guard.params.is}` : event === 'done' ? 'Done' : (t.description ?? event);
      out.push({ stepId: from, title: state.meta.title, answer });
    }
  }
  return out;
}

/**
 * Removes a step. Answers that led to it are kept with their now-missing
 * target so the checks point the author at each one to re-aim.
 */
export function deleteStep(doc: Doc, id: string): Doc {
  const { [id]: _gone, ...rest } = doc.machine.states;
  const initial = doc.machine.initial === id ? (Object.keys(rest)[0] ?? '') : doc.machine.initial;
  return { ...doc, machine: { ...doc.machine, initial, states: rest } };
}

/** Why a new step id cannot be used, or undefined when it can. */
export function stepIdProblem(doc: Doc, oldId: string, newId: string): string | undefined {
  if (!STEP_ID.test(newId)) return 'Use lower-case letters, digits and hyphens, like "check-pcv-hose".';
  if (newId.length > 64) return 'Keep the id under 64 characters.';
  if (newId !== oldId && newId in doc.machine.states) return `There is already a step "${newId}".`;
  return undefined;
}

/** Renames a step, keeping its place, and re-aims every answer and the start at the new id. */
export function renameStep(doc: Doc, oldId: string, newId: string): Doc {
  if (oldId === newId || stepIdProblem(doc, oldId, newId)) return doc;
  const retarget = (t: TransitionDef) => (t.target === oldId ? { ...t, target: newId } : t);
  const states = Object.fromEntries(
    Object.entries(doc.machine.states).map(([k, s]) => {
      const on = s.on ? Object.fromEntries(Object.entries(s.on).map(([e, d]) => [e, Array.isArray(d) ? d.map(retarget) : retarget(d)])) : undefined;
      return [k === oldId ? newId : k, on ? { ...s, on } : s];
    }),
  );
  return { ...doc, machine: { ...doc.machine, initial: doc.machine.initial === oldId ? newId : doc.machine.initial, states } };
}

/** Replaces one step's definition. */
export const setStep = (doc: Doc, id: string, step: StateDef): Doc => withStates(doc, { ...doc.machine.states, [id]: step });

/** Changes a step's kind, keeping what both kinds share. */
export const setKind = (doc: Doc, id: string, kind: StepKind): Doc => setStep(doc, id, stepOfKind(kind, doc.machine.states[id]));

export interface AnswerRow {
  event: string;
  label: string;
  target: string;
}

/** An ask step's answers as rows, in order. */
export function answersOf(state: StateDef): AnswerRow[] {
  return transitionsOf(state).map(({ event, t }) => ({ event, label: t.description ?? '', target: t.target }));
}

/** Writes an ask step's answers back from rows. */
export function withAnswers(state: StateDef, rows: AnswerRow[]): StateDef {
  return { ...state, on: Object.fromEntries(rows.map((r) => [r.event, { target: r.target, description: r.label }])) };
}

/** The event name for a new answer labelled `label` ("Yes, split" → "answer.yes-split"), unique in the step. */
export function answerEventFor(state: StateDef, label: string): string {
  const taken = new Set(Object.keys(state.on ?? {}));
  return freeName(`answer.${slugify(label, 'answer')}`, (n) => taken.has(n));
}

/** An action step's next step, or ''. */
export function nextOf(state: StateDef): string {
  const done = state.on?.done;
  return (Array.isArray(done) ? done[0]?.target : done?.target) ?? '';
}

/** Sets an action step's one answer, "done". */
export const withNext = (state: StateDef, target: string): StateDef => ({ ...state, on: target ? { done: { target } } : {} });

/** A reading step's target for each verdict its kind can give ('' where none is set). */
export function branchesOf(state: StateDef): Record<string, string> {
  const out: Record<string, string> = {};
  for (const { t } of transitionsOf(state)) if (t.guard) out[t.guard.params.is] = t.target;
  return out;
}

/** Writes a reading step's branches, one per verdict of its kind, in the calculator's order. */
export function withBranches(state: StateDef, targets: Record<string, string>): StateDef {
  if (state.meta.kind !== 'reading') return state;
  const verdicts = VERDICTS[state.meta.reading.kind] as readonly string[];
  const reading = verdicts.filter((v) => targets[v]).map((v) => ({ guard: { type: 'verdict' as const, params: { is: v as never } }, target: targets[v] }));
  return { ...state, on: reading.length ? { reading } : {} };
}

/** Changes the reading kind; branches for verdicts the new kind also gives are kept. */
export function withReadingKind(state: StateDef, kind: ReadingKind): StateDef {
  if (state.meta.kind !== 'reading' || state.meta.reading.kind === kind) return state;
  const targets = branchesOf(state);
  return withBranches({ ...state, meta: { ...state.meta, reading: defaultReading(kind) } }, targets);
}
