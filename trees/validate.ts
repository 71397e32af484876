/**
 * The tree validator: everything a tree author should hear about before a
 * tree is published, each finding named against its step, plus the figures
 * an author wants (step count, shortest path to each cause, longest path).
 */
import { treeDocSchema, type TreeDoc } from './tree-format';
import type { Finding, TreeStats } from './engine-types';
import { schemaFindings } from './schema-findings';
import { stepFindings } from './validate-steps';
import { distancesFrom, edgesFrom, isFinal, longestPathToFinal, loops, stepsThatCanFinish, successors } from './graph';

/** A cause that takes more answers than this to reach is worth a second look. */
export const LONG_PATH_WARNING = 15;

export interface Validation {
  findings: Finding[];
  stats: TreeStats;
  /** The parsed document when it matched the format (it may still have findings). */
  doc?: TreeDoc;
}

/** Checks a tree document of unknown shape and reports every problem found. */
export function validateTree(json: unknown): Validation {
  const parsed = treeDocSchema.safeParse(json);
  if (!parsed.success) {
    const states = (json as { machine?: { states?: unknown } } | null)?.machine?.states;
    const steps = states && typeof states === 'object' ? Object.keys(states).length : 0;
    return { findings: schemaFindings(parsed.error), stats: { steps, shortestToCause: {}, longestPath: 0 } };
  }
  const doc = parsed.data;
  const findings: Finding[] = [];
  for (const [id, state] of Object.entries(doc.machine.states)) findings.push(...stepFindings(id, state));
  findings.push(...graphFindings(doc));
  const stats = treeStats(doc);
  for (const [cause, n] of Object.entries(stats.shortestToCause)) {
    if (n > LONG_PATH_WARNING) {
      findings.push({
        severity: 'warning',
        stepId: cause,
        code: 'long_path_to_cause',
        message: `Step "${cause}": the shortest walk to this cause takes ${n} answers. Consider an earlier check that gets there sooner.`,
      });
    }
  }
  if (doc.machine.id !== doc.id) {
    findings.push({ severity: 'warning', code: 'machine_id_mismatch', message: `The machine id "${doc.machine.id}" differs from the tree id "${doc.id}"; keep them the same.` });
  }
  return { findings, stats, doc };
}

/** Figures for a parsed tree: step count, fewest answers to each cause, longest path. */
export function treeStats(doc: TreeDoc): TreeStats {
  const dist = distancesFrom(doc, doc.machine.initial);
  const shortestToCause: Record<string, number> = {};
  for (const [id, d] of dist) if (doc.machine.states[id].meta.kind === 'cause') shortestToCause[id] = d;
  return { steps: Object.keys(doc.machine.states).length, shortestToCause, longestPath: longestPathToFinal(doc, doc.machine.initial) };
}

function graphFindings(doc: TreeDoc): Finding[] {
  const out: Finding[] = [];
  const states = doc.machine.states;
  const ids = Object.keys(states);

  for (const id of ids) {
    for (const e of edgesFrom(doc, id)) {
      if (states[e.target]) continue;
      const which = e.verdict ? `the "${e.verdict}" branch` : e.label ? `the answer "${e.label}"` : `the "${e.event}" answer`;
      out.push({ severity: 'error', stepId: id, code: 'unknown_target', message: `Step "${id}": ${which} leads to "${e.target}", which is not a step in this tree.` });
    }
  }

  if (!states[doc.machine.initial]) {
    out.push({ severity: 'error', code: 'missing_initial', message: `The tree starts at "${doc.machine.initial}", but there is no step with that id. Set "initial" to the first step.` });
    return out;
  }

  const reachable = distancesFrom(doc, doc.machine.initial);
  for (const id of ids) {
    if (!reachable.has(id)) {
      out.push({ severity: 'error', stepId: id, code: 'unreachable', message: `Step "${id}": no answer leads here from the start, so no walk can reach it. Link it from another step or remove it.` });
    }
  }

  const canFinish = stepsThatCanFinish(doc);
  const trapped = new Set<string>();
  for (const group of loops(doc)) {
    if (!reachable.has(group[0]) || group.some((id) => canFinish.has(id))) continue;
    // Name the loop by the step a walk meets first.
    group.sort((a, b) => reachable.get(a)! - reachable.get(b)!);
    group.forEach((id) => trapped.add(id));
    const names = group.map((id) => `"${id}"`).join(', ');
    out.push({
      severity: 'error',
      stepId: group[0],
      code: 'no_exit_loop',
      message: `Step "${group[0]}": steps ${names} lead only to each other, so a walk that enters them can never end. Give one of them a way out to a cause or refer step.`,
    });
  }
  for (const id of reachable.keys()) {
    const leaves = successors(doc, id).length > 0; // unknown targets are reported above
    if (!isFinal(states[id]) && leaves && !canFinish.has(id) && !trapped.has(id)) {
      out.push({
        severity: 'error',
        stepId: id,
        code: 'cannot_finish',
        message: `Step "${id}": every way on from here ends in a step with no way out, so the walk can never finish.`,
      });
    }
  }
  return out;
}
