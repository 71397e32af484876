import type { WalkEvent } from '@/trees/engine-types';
import type { WalkPhoto, WalkStepRecord, WalkSummary } from '@/shared/schemas/walks';
import type { WalkPhotoRow, WalkRow, WalkStepRow } from '../repositories/walk-repository';
import type { PinnedTree } from '../repositories/walk-tree-repository';

/** Longest pause counted towards time spent: a car left overnight is not hours of work. */
export const MAX_COUNTED_GAP_S = 20 * 60;

/**
 * The events still in force, in order: each undo takes back the latest
 * answer not already taken back. History itself is never changed.
 */
export function effectiveSteps(steps: readonly WalkStepRow[]): { live: WalkStepRow[]; undone: Set<string> } {
  const live: WalkStepRow[] = [];
  const undone = new Set<string>();
  for (const s of steps) {
    if (s.kind === 'event') live.push(s);
    else {
      const taken = live.pop();
      if (taken) undone.add(taken.id);
    }
  }
  return { live, undone };
}

/** The events to replay, from the step records still in force. */
export const liveEvents = (steps: readonly WalkStepRow[]): WalkEvent[] => effectiveSteps(steps).live.map((s) => s.event as WalkEvent);

/** Seconds of work: the gaps between start, each step and the end, each capped at MAX_COUNTED_GAP_S. */
export function timeSpentSeconds(startedAt: Date, stepTimes: readonly Date[], end: Date): number {
  const marks = [startedAt, ...stepTimes, end].map((d) => new Date(d).getTime());
  let total = 0;
  for (let i = 1; i < marks.length; i++) total += Math.min(Math.max(0, marks[i] - marks[i - 1]) / 1000, MAX_COUNTED_GAP_S);
  return Math.round(total);
}

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
const person = (id: number | null, name: string | null | undefined) => (id ? { id, name: name ?? 'Former staff' } : null);

/** A step record as the API returns it. */
export function toStepRecord(s: WalkStepRow, undone: Set<string>): WalkStepRecord {
  return {
    id: s.id,
    seq: s.seq,
    kind: s.kind,
    event: s.event ?? null,
    undoesStepId: s.undoes_step_id,
    undone: undone.has(s.id),
    fromStep: s.from_step,
    toStep: s.to_step,
    verdict: s.verdict,
    readingValue: s.reading_value,
    readingUnit: s.reading_unit,
    judgement: (s.judgement as WalkStepRecord['judgement']) ?? null,
    note: s.note,
    by: person(s.user_id, s.user_name),
    createdAt: new Date(s.created_at).toISOString(),
  };
}

/** A walk as the API returns it. */
export function toWalkSummary(w: WalkRow, tree: PinnedTree): WalkSummary {
  return {
    id: w.id,
    status: w.status,
    outcome: w.outcome,
    jobId: w.job_id,
    tree: { id: tree.treeId, versionId: tree.versionId, version: tree.version, title: tree.title, symptom: tree.symptom },
    currentStep: w.current_step,
    stepCount: w.step_count,
    causeStep: w.cause_step,
    causeCode: w.cause_code,
    causeText: w.cause_text,
    finishNote: w.finish_note,
    startedBy: person(w.started_by, w.started_by_name),
    finishedBy: person(w.finished_by, w.finished_by_name),
    startedAt: new Date(w.started_at).toISOString(),
    lastStepAt: iso(w.last_step_at),
    finishedAt: iso(w.finished_at),
    timeSpentS: w.time_spent_s,
    context: { altitudeM: w.altitude_m, ...(w.baro_kpa !== null ? { baroKpa: w.baro_kpa } : {}) },
  };
}

/** A walk photo with the URLs that serve it (ids only, never file paths). */
export function toWalkPhoto(p: WalkPhotoRow): WalkPhoto {
  return {
    id: p.photo_id,
    step: p.step_id,
    atSeq: p.at_seq,
    caption: p.caption,
    width: p.width,
    height: p.height,
    url: `/api/photos/${p.photo_id}`,
    thumbUrl: `/api/photos/${p.photo_id}/thumb`,
    createdAt: new Date(p.created_at).toISOString(),
  };
}
