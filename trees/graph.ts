/**
 * Plain graph walks over a tree's steps: who follows whom, what can be
 * reached, how far the nearest cause is, loops. The engine and the validator
 * share these so "reachable" means the same thing in both.
 */
import type { StateDef, TransitionDef, TreeDoc } from './tree-format';

/** One way out of a step: an event and, for reading steps, the verdict that picks it. */
export interface Edge {
  from: string;
  event: string;
  target: string;
  verdict?: string;
  label?: string;
}

/** A step's transitions as a flat list, keeping the document order. */
export function transitionsOf(state: StateDef): Array<{ event: string; t: TransitionDef }> {
  const out: Array<{ event: string; t: TransitionDef }> = [];
  for (const [event, def] of Object.entries(state.on ?? {})) {
    for (const t of Array.isArray(def) ? def : [def]) out.push({ event, t });
  }
  return out;
}

/** Every edge of the tree, unknown targets included (the validator reports them). */
export function edgesFrom(doc: TreeDoc, stepId: string): Edge[] {
  const state = doc.machine.states[stepId];
  if (!state) return [];
  return transitionsOf(state).map(({ event, t }) => ({
    from: stepId,
    event,
    target: t.target,
    verdict: t.guard?.params.is,
    label: t.description,
  }));
}

/** Distinct existing steps reachable in one answer from stepId, in document order. */
export function successors(doc: TreeDoc, stepId: string): string[] {
  const seen = new Set<string>();
  for (const e of edgesFrom(doc, stepId)) if (doc.machine.states[e.target]) seen.add(e.target);
  return [...seen];
}

/** Fewest answers from `from` to every reachable step; the map's order is breadth-first. */
export function distancesFrom(doc: TreeDoc, from: string): Map<string, number> {
  const dist = new Map<string, number>();
  if (!doc.machine.states[from]) return dist;
  dist.set(from, 0);
  const queue = [from];
  while (queue.length) {
    const id = queue.shift()!;
    for (const next of successors(doc, id)) {
      if (!dist.has(next)) {
        dist.set(next, dist.get(id)! + 1);
        queue.push(next);
      }
    }
  }
  return dist;
}

/** Steps reachable from the initial step, breadth-first (the order a reader meets them). */
export function stepsInOrder(doc: TreeDoc): string[] {
  return [...distancesFrom(doc, doc.machine.initial).keys()];
}

/** Answers still needed from stepId to the nearest cause step, or null when none can be reached. */
export function answersToNearestCause(doc: TreeDoc, stepId: string): number | null {
  let best: number | null = null;
  for (const [id, d] of distancesFrom(doc, stepId)) {
    if (doc.machine.states[id].meta.kind === 'cause' && (best === null || d < best)) best = d;
  }
  return best;
}

/** Whether a step ends a walk (xstate's `type: 'final'`). */
export const isFinal = (state: StateDef | undefined) => state?.type === 'final';

/** Steps from which some final step can be reached (a reverse walk from the final steps). */
export function stepsThatCanFinish(doc: TreeDoc): Set<string> {
  const preds = new Map<string, string[]>();
  for (const id of Object.keys(doc.machine.states)) {
    for (const next of successors(doc, id)) preds.set(next, [...(preds.get(next) ?? []), id]);
  }
  const ok = new Set(Object.keys(doc.machine.states).filter((id) => isFinal(doc.machine.states[id])));
  const queue = [...ok];
  while (queue.length) {
    for (const p of preds.get(queue.shift()!) ?? []) {
      if (!ok.has(p)) {
        ok.add(p);
        queue.push(p);
      }
    }
  }
  return ok;
}

/** Strongly connected sets of steps that form a loop (Tarjan's algorithm). Singletons count only with a self-loop. */
export function loops(doc: TreeDoc): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const out: string[][] = [];
  let counter = 0;
  const visit = (v: string) => {
    index.set(v, counter);
    low.set(v, counter++);
    stack.push(v);
    onStack.add(v);
    for (const w of successors(doc, v)) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(low.get(v)!, index.get(w)!));
      }
    }
    if (low.get(v) === index.get(v)) {
      const group: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        group.push(w);
      } while (w !== v);
      if (group.length > 1 || successors(doc, v).includes(v)) out.push(group.reverse());
    }
  };
  for (const id of Object.keys(doc.machine.states)) if (!index.has(id)) visit(id);
  return out;
}

// Trees are small (tens of steps) and sparse, so an exhaustive search of simple
// paths is fine; the budget keeps a pathological hand-made tree from hanging.
const LONGEST_PATH_BUDGET = 200_000;

/** The most answers a walk can take from `from` to a final step without visiting a step twice. */
export function longestPathToFinal(doc: TreeDoc, from: string): number {
  let best = 0;
  let budget = LONGEST_PATH_BUDGET;
  const onPath = new Set<string>();
  const walk = (id: string, depth: number) => {
    if (--budget < 0) return;
    if (isFinal(doc.machine.states[id])) {
      best = Math.max(best, depth);
      return;
    }
    onPath.add(id);
    for (const next of successors(doc, id)) if (!onPath.has(next)) walk(next, depth + 1);
    onPath.delete(id);
  };
  if (doc.machine.states[from]) walk(from, 0);
  return best;
}
