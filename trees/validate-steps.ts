/**
 * Rules about single steps: is it final when it should be, does it offer the
 * right kind of answers, does a reading step cover every verdict.
 */
import { VERDICTS } from '@/shared/readings/reading-kinds';
import { ANSWER_EVENT, type StateDef } from './tree-format';
import type { Finding, FindingCode } from './engine-types';
import { transitionsOf } from './graph';

/** Findings about one step's own shape (not about where its answers lead). */
export function stepFindings(id: string, state: StateDef): Finding[] {
  const out: Finding[] = [];
  const err = (code: FindingCode, message: string) => out.push({ severity: 'error', stepId: id, code, message: `Step "${id}": ${message}` });
  const kind = state.meta.kind;
  const ends = kind === 'cause' || kind === 'refer';
  const ts = transitionsOf(state);

  if (state.type === 'final' && !ends) {
    err('final_wrong_kind', `it ends the walk but is ${article(kind)} step. Only cause and refer steps end a walk: change its kind, or remove "type": "final".`);
  }
  if (ends && state.type !== 'final') {
    err('not_final', `${article(kind)} step must end the walk. Add "type": "final" to it.`);
  }
  if (state.type === 'final' && ts.length > 0) {
    err('final_has_answers', 'it ends the walk, so its answers can never be chosen. Remove them.');
  }
  if (state.type !== 'final' && ts.length === 0) {
    err('dead_end', 'it has no answers, so a walk that reaches it is stuck. Give it a way on, or make it a cause or refer step.');
  }
  if (state.type === 'final' || ts.length === 0) return out;

  if (kind !== 'reading') {
    for (const { event } of ts.filter(({ t }) => t.guard)) {
      err('guard_outside_reading', `the answer "${event}" has a verdict condition, but only reading steps branch on verdicts. Remove the "guard".`);
    }
  }

  if (kind === 'ask') {
    const labels = new Map<string, { event: string; label: string }>();
    for (const [event, def] of Object.entries(state.on ?? {})) {
      if (!ANSWER_EVENT.test(event)) {
        err('bad_answer_event', `the answer "${event}" must be named like "answer.yes" or "answer.hose-split" (lower-case words and hyphens after "answer.").`);
      }
      if (Array.isArray(def) && def.length > 1) {
        err('bad_answer_event', `the answer "${event}" lists ${def.length} targets; an answer leads to exactly one step.`);
      }
      for (const t of Array.isArray(def) ? def : [def]) {
        const label = t.description?.trim();
        if (!label) {
          err('missing_label', `the answer "${event}" has no label. Write the words for its button in "description".`);
          continue;
        }
        const key = label.toLowerCase();
        const other = labels.get(key);
        if (other && other.event !== event) {
          err('duplicate_label', `two answers ("${other.event}" and "${event}") are both labelled "${other.label}"; the technician cannot tell them apart.`);
        }
        if (!other) labels.set(key, { event, label });
      }
    }
  }

  if (kind === 'action') {
    const events = [...new Set(ts.map(({ event }) => event))];
    if (events.length !== 1 || events[0] !== 'done' || ts.length !== 1) {
      err('action_needs_one_done', `an action step has exactly one answer, "done", leading to the next step (found ${events.map((e) => `"${e}"`).join(', ')}).`);
    }
  }

  if (kind === 'reading') out.push(...readingFindings(id, state));
  return out;
}

function readingFindings(id: string, state: StateDef): Finding[] {
  if (state.meta.kind !== 'reading') return [];
  const out: Finding[] = [];
  const err = (code: FindingCode, message: string) => out.push({ severity: 'error', stepId: id, code, message: `Step "${id}": ${message}` });
  const readingKind = state.meta.reading.kind;
  const allowed: readonly string[] = VERDICTS[readingKind];
  const covered = new Set<string>();
  for (const { event, t } of transitionsOf(state)) {
    if (event !== 'reading') {
      err('reading_bad_event', `a reading step answers only with the event "reading" (found "${event}"). Branch on the verdict instead.`);
      continue;
    }
    if (!t.guard) {
      err('reading_unguarded', `the branch to "${t.target}" has no verdict. Add "guard": { "type": "verdict", "params": { "is": "…" } }.`);
      continue;
    }
    const v = t.guard.params.is;
    if (!allowed.includes(v)) {
      err('verdict_not_for_kind', `the verdict "${v}" is never given for a ${readingKind} reading (it gives ${allowed.join(', ')}).`);
    } else if (covered.has(v)) {
      err('duplicate_verdict', `the verdict "${v}" has two branches; only the first would ever be taken.`);
    }
    covered.add(v);
  }
  const missing = allowed.filter((v) => !covered.has(v));
  if (missing.length > 0) {
    err('verdicts_uncovered', `a ${readingKind} reading can be judged ${missing.map((v) => `"${v}"`).join(', ')}, but no branch says where to go then. Add a branch for ${missing.length === 1 ? 'it' : 'each'}.`);
  }
  return out;
}

const article = (kind: string) => (/^[aeiou]/.test(kind) ? `an ${kind}` : `a ${kind}`);
