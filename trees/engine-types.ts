/**
 * Public types of the tree engine and validator (see trees/ENGINE.md).
 * Kept apart from the engine so screens and schemas can import them without
 * pulling in xstate or the readings calculator.
 */
import { z } from 'zod';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS, type Verdict } from '@/shared/readings/reading-kinds';
import { ANSWER_EVENT } from './tree-format';

/** What the readings check needs to know about where the car is. */
export interface WalkContext {
  altitudeM?: number;
  baroKpa?: number;
}

/** One event of a walk, as stored with the walk and sent to the engine. */
export const walkEventSchema = z.union([
  z.object({
    type: z.literal('reading'),
    value: z.number({ message: 'Type the reading as a number.' }),
    unit: z.string().min(1).max(16).optional(),
    needle: z.enum(NEEDLE_BEHAVIOURS).optional(),
    profile: z.enum(ENGINE_PROFILES).optional(),
  }),
  z.object({ type: z.literal('done') }),
  z.object({ type: z.string().regex(ANSWER_EVENT, 'Answers are named like "answer.yes".') }),
]);

export type ReadingEvent = Extract<z.infer<typeof walkEventSchema>, { type: 'reading' }>;
export type AnswerEvent = { type: `answer.${string}` };
export type WalkEvent = ReadingEvent | { type: 'done' } | AnswerEvent;

/** One thing a technician can do at a step. */
export interface AvailableAnswer {
  /** The event to send: `answer.<slug>`, `reading` or `done`. */
  event: string;
  /** The button label (for a reading step, what to measure). */
  label: string;
  /** Where the answer leads (absent for a reading step: the verdict decides). */
  target?: string;
  /** Reading steps only: which step each verdict leads to, in the calculator's order. */
  branches?: Array<{ verdict: Verdict; target: string }>;
}

/** Where a replayed walk stands. */
export interface WalkPosition {
  stepId: string;
  final: boolean;
  /** Step ids visited, starting with the initial step and ending with stepId. */
  path: string[];
}

/** A problem the validator found, named against the step where it is. */
export interface Finding {
  severity: 'error' | 'warning';
  stepId?: string;
  code: FindingCode;
  message: string;
}

export const FINDING_CODES = [
  'schema',
  'missing_initial',
  'unknown_target',
  'unreachable',
  'dead_end',
  'not_final',
  'final_wrong_kind',
  'final_has_answers',
  'verdicts_uncovered',
  'verdict_not_for_kind',
  'duplicate_verdict',
  'reading_bad_event',
  'reading_unguarded',
  'bad_answer_event',
  'missing_label',
  'duplicate_label',
  'action_needs_one_done',
  'guard_outside_reading',
  'no_exit_loop',
  'cannot_finish',
  'long_path_to_cause',
  'machine_id_mismatch',
] as const;
export type FindingCode = (typeof FINDING_CODES)[number];

/** Figures an author wants about a tree. Paths count answers given (edges), not steps shown. */
export interface TreeStats {
  steps: number;
  /** For each reachable cause step id, the fewest answers from the start to reach it. */
  shortestToCause: Record<string, number>;
  /** The most answers a walk can take from the start to a final step without repeating a step. */
  longestPath: number;
}

/** Why the engine refused something; `code` lets callers pick an HTTP status. */
export class TreeEngineError extends Error {
  constructor(
    readonly code: 'invalid_tree' | 'unknown_step' | 'event_refused',
    message: string,
    /** For replay: the index of the stored event that was refused. */
    readonly eventIndex?: number,
  ) {
    super(message);
    this.name = 'TreeEngineError';
  }
}
