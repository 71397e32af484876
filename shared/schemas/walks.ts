import { z } from 'zod';
import { walkEventSchema } from '@/trees/engine-types';
import { treeDocSchema } from '@/trees/tree-format';
import { jobSchema } from './jobs';

export const WALK_OUTCOMES = ['fixed', 'not_fixed', 'referred'] as const;
export type WalkOutcome = (typeof WALK_OUTCOMES)[number];
export const WALK_OUTCOME_LABELS: Record<WalkOutcome, string> = {
  fixed: 'Fixed',
  not_fixed: 'Not fixed',
  referred: 'Referred on',
};

const clientId = z.uuid({ message: 'Each step needs a fresh id (a UUID) from the app.' });
const note = z
  .string()
  .trim()
  .max(2000, 'Keep the note under 2000 characters.')
  .nullish()
  .transform((v) => (v ? v : null));

/** POST /api/walks: start a walk on a job with a tree's published version. */
export const walkStartSchema = z.object({
  jobId: z.number({ message: 'Choose the job.' }).int().positive(),
  treeId: z.number({ message: 'Choose a tree.' }).int().positive(),
});
export type WalkStart = z.infer<typeof walkStartSchema>;

/** POST /api/walks/:id/steps: one answer, reading or "done", with the id the app made for it. */
export const walkStepInputSchema = z.object({
  stepId: clientId,
  event: walkEventSchema,
  note,
});
export type WalkStepInput = z.input<typeof walkStepInputSchema>;

/** POST /api/walks/:id/undo: takes back the last answer (recorded, never erased). */
export const walkUndoInputSchema = z.object({ stepId: clientId });

/** POST /api/walks/:id/finish. */
export const walkFinishSchema = z.object({
  outcome: z.enum(WALK_OUTCOMES, { message: 'Choose fixed, not fixed or referred.' }),
  causeText: note,
  note,
});
export type WalkFinish = z.input<typeof walkFinishSchema>;

/** Multipart fields sent beside a photo file. */
export const walkPhotoFieldsSchema = z.object({
  step: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Name the step the photo belongs to.').max(64),
  caption: z.string().trim().max(200, 'Keep the caption under 200 characters.').optional(),
});

const person = z.object({ id: z.number(), name: z.string() }).nullable();

/** One step record: an answer taken, or an undo of the last one. */
export const walkStepRecordSchema = z.object({
  id: z.string(),
  seq: z.number(),
  kind: z.enum(['event', 'undo']),
  event: z.unknown().nullable(),
  undoesStepId: z.string().nullable(),
  /** True when a later undo took this answer back. */
  undone: z.boolean(),
  fromStep: z.string(),
  toStep: z.string(),
  verdict: z.string().nullable(),
  readingValue: z.number().nullable(),
  readingUnit: z.string().nullable(),
  judgement: z
    .object({ verdict: z.string(), summary: z.string(), expected: z.object({ low: z.number(), high: z.number(), unit: z.string() }).optional() })
    .passthrough()
    .nullable(),
  note: z.string().nullable(),
  by: person,
  createdAt: z.string(),
});
export type WalkStepRecord = z.infer<typeof walkStepRecordSchema>;

export const walkPhotoSchema = z.object({
  id: z.string(),
  step: z.string(),
  atSeq: z.number(),
  caption: z.string().nullable(),
  width: z.number(),
  height: z.number(),
  url: z.string(),
  thumbUrl: z.string(),
  createdAt: z.string(),
});
export type WalkPhoto = z.infer<typeof walkPhotoSchema>;

/** Where the walk stands, replayed on the server from its recorded answers. */
export const walkPositionSchema = z.object({
  stepId: z.string(),
  final: z.boolean(),
  path: z.array(z.string()),
  stepsTaken: z.number(),
  /** Answers still needed to reach the nearest cause, or null when none can be reached. */
  shortestToCause: z.number().nullable(),
});
export type WalkPosition = z.infer<typeof walkPositionSchema>;

export const walkSummarySchema = z.object({
  id: z.number(),
  status: z.enum(['open', 'finished']),
  outcome: z.enum(WALK_OUTCOMES).nullable(),
  jobId: z.number().nullable(),
  tree: z.object({ id: z.number(), versionId: z.number(), version: z.number(), title: z.string(), symptom: z.string() }),
  currentStep: z.string(),
  stepCount: z.number(),
  causeStep: z.string().nullable(),
  causeCode: z.string().nullable(),
  causeText: z.string().nullable(),
  finishNote: z.string().nullable(),
  startedBy: person,
  finishedBy: person,
  startedAt: z.string(),
  lastStepAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  timeSpentS: z.number().nullable(),
  /** What the readings were judged at: fixed when the walk started. */
  context: z.object({ altitudeM: z.number(), baroKpa: z.number().optional() }),
});
export type WalkSummary = z.infer<typeof walkSummarySchema>;

/** GET /api/walks/:id: everything the walk screen and the report need. */
export const walkDetailSchema = z.object({
  walk: walkSummarySchema,
  job: jobSchema.nullable(),
  shop: z.object({ name: z.string(), pressureUnit: z.string() }),
  doc: treeDocSchema,
  position: walkPositionSchema,
  history: z.array(walkStepRecordSchema),
  photos: z.array(walkPhotoSchema),
});
export type WalkDetail = z.infer<typeof walkDetailSchema>;

/** Answer to a recorded step or undo: the record and where the walk now stands. */
export const walkStepAnswerSchema = z.object({ step: walkStepRecordSchema, position: walkPositionSchema });
export type WalkStepAnswer = z.infer<typeof walkStepAnswerSchema>;

export const walkListSchema = z.object({ items: z.array(walkSummarySchema) });
export type WalkList = z.infer<typeof walkListSchema>;
