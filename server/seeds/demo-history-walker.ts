import { applyEvent, type WalkContext, type WalkEvent } from '@/trees/engine';
import { edgesFrom, type Edge } from '@/trees/graph';
import type { TreeDoc } from '@/trees/tree-format';
import { judgeReading } from '@/shared/readings/judge-reading';
import type { ReadingParams } from '@/shared/readings/reading-kinds';
import type { Random } from './demo-history-random';

/** One step record the walker made, as the walk service would have stored it. */
export interface WalkedStep {
  kind: 'event' | 'undo';
  event: WalkEvent | null;
  from: string;
  to: string;
  verdict: string | null;
  readingValue: number | null;
  readingUnit: string | null;
  judgement: unknown;
  /** Index (in this list) of the answer an undo takes back. */
  undoes?: number;
}

/** Fewest answers from every step to `goal` (reverse breadth-first search over the tree's edges). */
function distancesTo(doc: TreeDoc, goal: string): Map<string, number> {
  const incoming = new Map<string, string[]>();
  for (const id of Object.keys(doc.machine.states)) {
    for (const e of edgesFrom(doc, id)) incoming.set(e.target, [...(incoming.get(e.target) ?? []), id]);
  }
  const dist = new Map([[goal, 0]]);
  const queue = [goal];
  while (queue.length) {
    const id = queue.shift()!;
    for (const prev of incoming.get(id) ?? []) {
      if (!dist.has(prev)) {
        dist.set(prev, dist.get(id)! + 1);
        queue.push(prev);
      }
    }
  }
  return dist;
}

/** Values worth trying for a reading, spread over every verdict. */
function candidates(params: ReadingParams): Array<{ value: number; unit?: string }> {
  const out: Array<{ value: number; unit?: string }> = [];
  if (params.kind === 'fuel_trim') for (let v = -40; v <= 40; v += 0.5) out.push({ value: v });
  else if (params.kind === 'idle_vacuum') for (let v = 2; v <= 26; v += 0.25) out.push({ value: v, unit: 'inHg' });
  else {
    const span = Math.max(1, params.max - params.min);
    for (let v = params.min - span / 2; v <= params.max + span / 2; v += span / 60) out.push({ value: Math.round(v * 100) / 100 });
  }
  return out;
}

// Values per (reading step, verdict, altitude): judging every candidate again for each walk is the slow part.
const hitCache = new WeakMap<ReadingParams, Map<string, Array<{ value: number; unit?: string }>>>();

/** A reading the readings check itself judges `verdict` (so no threshold is copied here), picked at random among those that do. */
function readingFor(params: ReadingParams, verdict: string, ctx: WalkContext, random: Random): WalkEvent | undefined {
  const cache = hitCache.get(params) ?? new Map<string, Array<{ value: number; unit?: string }>>();
  hitCache.set(params, cache);
  const key = `${verdict}|${ctx.altitudeM ?? 0}|${ctx.baroKpa ?? ''}`;
  let hits = cache.get(key);
  if (!hits) {
    hits = candidates(params).filter((c) => {
      try {
        return judgeReading(params, c, ctx).verdict === verdict;
      } catch {
        return false;
      }
    });
    cache.set(key, hits);
  }
  return hits.length ? ({ type: 'reading', ...random.pick(hits) } as WalkEvent) : undefined;
}

function eventFor(doc: TreeDoc, edge: Edge, ctx: WalkContext, random: Random): WalkEvent | undefined {
  if (edge.event !== 'reading') return { type: edge.event } as WalkEvent;
  const meta = doc.machine.states[edge.from].meta;
  return meta.kind === 'reading' && edge.verdict ? readingFor(meta.reading, edge.verdict, ctx, random) : undefined;
}

/**
 * Walks a tree from its first step to `goal` through the real engine: every
 * answer is offered to applyEvent, so the records are ones the server would
 * have accepted. Mostly heads straight for the goal, sometimes takes a
 * detour, and now and then records a wrong answer and its undo. With
 * `stopAfter`, stops there (a walk left unfinished).
 */
export function walkTo(doc: TreeDoc, goal: string, ctx: WalkContext, random: Random, opts: { detour?: number; undo?: number; stopAfter?: number } = {}): { steps: WalkedStep[]; at: string } {
  const dist = distancesTo(doc, goal);
  const live: WalkEvent[] = [];
  const liveIdx: number[] = [];
  const steps: WalkedStep[] = [];
  let at = doc.machine.initial;
  let guard = 0;
  const take = (edge: Edge): boolean => {
    const event = eventFor(doc, edge, ctx, random);
    if (!event) return false;
    const r = applyEvent(doc, live, event, ctx);
    if (!r.ok) return false;
    const reading = event.type === 'reading' ? (event as Extract<WalkEvent, { type: 'reading' }>) : undefined;
    steps.push({
      kind: 'event',
      event,
      from: at,
      to: r.stepId,
      verdict: r.verdict ?? null,
      readingValue: reading ? reading.value : null,
      readingUnit: reading ? (reading.unit ?? r.judgement?.expected?.unit ?? null) : null,
      judgement: r.judgement ?? null,
    });
    live.push(event);
    liveIdx.push(steps.length - 1);
    at = r.stepId;
    return true;
  };
  while (at !== goal && guard++ < 60) {
    if (opts.stopAfter !== undefined && live.length >= opts.stopAfter) break;
    const edges = edgesFrom(doc, at);
    const here = dist.get(at) ?? Infinity;
    const closer = edges.filter((e) => (dist.get(e.target) ?? Infinity) < here);
    const possible = edges.filter((e) => dist.has(e.target));
    const wrong = edges.filter((e) => !dist.has(e.target) && doc.machine.states[e.target]?.type !== 'final');
    if (wrong.length && random.chance(opts.undo ?? 0) && take(random.pick(wrong))) {
      const taken = liveIdx.pop()!;
      live.pop();
      steps.push({ kind: 'undo', event: null, from: at, to: steps[taken].from, verdict: null, readingValue: null, readingUnit: null, judgement: null, undoes: taken });
      at = steps[taken].from;
      continue;
    }
    const detour = guard < 20 && random.chance(opts.detour ?? 0) ? possible : closer;
    const order = [...(detour.length ? detour : closer)].sort(() => random.next() - 0.5);
    if (!order.some(take)) throw new Error(`The demo walker is stuck at "${at}" on the way to "${goal}" in ${doc.id}.`);
  }
  return { steps, at };
}
