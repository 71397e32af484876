import type { Job } from './schemas/jobs';
import type { WalkPosition } from './schemas/walks';

/**
 * The words of the walk screen that the app draws and the server draws in a
 * walk page's first paint (server/http/walk-first-paint.ts): one source, so
 * the two never say different things.
 */

/** The caution panel's heading and closing line, around each hazard's words. */
export const CAUTION_HEADING = '⚠ Caution: read before you start';
export const CAUTION_DEFER = "Follow the vehicle maker's service information, local codes and licensed practice.";

/** The button that takes back the latest answer. */
export const BACK_LABEL = '‹ Back: undo last answer';

/** How a step's kind reads above its title. */
export const STEP_KIND_WORDS = { ask: 'Check', reading: 'Measure', action: 'Do', cause: 'Cause found', refer: 'Hand over' } as const;

/** Steps taken and the shortest way left to a cause, in words and as a share of the way. */
export function walkProgress(position: WalkPosition) {
  const left = position.shortestToCause;
  const taken = position.stepsTaken;
  const fraction = position.final ? 1 : left === null ? 0 : taken / (taken + left);
  const words = position.final
    ? 'End of the tree reached'
    : left === null
      ? 'No cause can be reached from here'
      : `At least ${left} more ${left === 1 ? 'answer' : 'answers'} to a cause`;
  return { taken: `${taken} ${taken === 1 ? 'answer' : 'answers'} so far`, words, percent: Math.round(fraction * 100) };
}

/** The job a walk is on, in one line: RO, customer and the vehicle when known. */
export function walkJobLine(job: Pick<Job, 'roNumber' | 'customerName' | 'year' | 'make' | 'model'>): string {
  const vehicle = job.make || job.model ? ` · ${[job.year, job.make, job.model].filter(Boolean).join(' ')}` : '';
  return `RO ${job.roNumber} · ${job.customerName}${vehicle}`;
}
