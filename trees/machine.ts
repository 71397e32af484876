/**
 * Turns a tree document into an xstate v5 machine. The stored config is used
 * as it is; the only change is that each verdict guard also receives its
 * step's reading parameters, because an xstate guard sees the context and the
 * event but not which state it belongs to.
 */
import { setup } from 'xstate';
import { judgeReading } from '@/shared/readings/judge-reading';
import type { ReadingParams } from '@/shared/readings/reading-kinds';
import type { StateDef, TreeDoc } from './tree-format';
import type { ReadingEvent, WalkContext, WalkEvent } from './engine-types';

/** What the readings check says about one reading. */
export type Judgement = ReturnType<typeof judgeReading>;

interface VerdictGuardParams {
  is: string;
  /** Filled in by buildTreeMachine from the step's `meta.reading`. */
  reading?: ReadingParams;
}

// Every branch of a reading step asks for the verdict of the same event; judge
// it once. Keyed by the event object, checked against the step and the context.
const judged = new WeakMap<object, { params: ReadingParams; altitudeM?: number; baroKpa?: number; result: Judgement }>();

/** Judges a reading event with the readings check (remembered per event object). */
export function judgeReadingEvent(params: ReadingParams, event: ReadingEvent, ctx: WalkContext): Judgement {
  const hit = judged.get(event);
  if (hit && hit.params === params && hit.altitudeM === ctx.altitudeM && hit.baroKpa === ctx.baroKpa) return hit.result;
  const result = judgeReading(
    params,
    { value: event.value, unit: event.unit, needle: event.needle, profile: event.profile },
    { altitudeM: ctx.altitudeM, baroKpa: ctx.baroKpa },
  );
  judged.set(event, { params, altitudeM: ctx.altitudeM, baroKpa: ctx.baroKpa, result });
  return result;
}

const treeSetup = setup({
  types: {
    context: {} as WalkContext,
    input: {} as WalkContext | undefined,
    events: {} as WalkEvent,
  },
  guards: {
    verdict: ({ event, context }, params: VerdictGuardParams) => {
      if (event.type !== 'reading' || !params.reading) return false;
      return judgeReadingEvent(params.reading, event as ReadingEvent, context).verdict === params.is;
    },
  },
});

/** The xstate config for one step, with reading parameters handed to its verdict guards. */
function stateConfig(state: StateDef) {
  const reading = state.meta.kind === 'reading' ? state.meta.reading : undefined;
  const on: Record<string, unknown> = {};
  for (const [event, def] of Object.entries(state.on ?? {})) {
    const list = Array.isArray(def) ? def : [def];
    const mapped = list.map((t) => ({
      target: t.target,
      ...(t.description ? { description: t.description } : {}),
      ...(t.guard ? { guard: { type: 'verdict', params: { is: t.guard.params.is, reading } } } : {}),
    }));
    on[event] = Array.isArray(def) ? mapped : mapped[0];
  }
  return { ...(state.type ? { type: state.type } : {}), meta: state.meta, ...(state.on ? { on } : {}) };
}

/** Builds the xstate machine for a parsed tree; input `{ altitudeM, baroKpa }` becomes its context. */
export function buildTreeMachine(doc: TreeDoc) {
  const states = Object.fromEntries(Object.entries(doc.machine.states).map(([id, s]) => [id, stateConfig(s)]));
  return treeSetup.createMachine({
    id: doc.machine.id,
    initial: doc.machine.initial,
    context: ({ input }) => ({ altitudeM: input?.altitudeM, baroKpa: input?.baroKpa }),
    // The config comes from data, so its step names cannot be known to the type system.
    states: states as never,
  });
}

export type TreeMachine = ReturnType<typeof buildTreeMachine>;
