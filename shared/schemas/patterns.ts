/**
 * Request and answer shapes of the Patterns API (GET /api/patterns and friends).
 * Dates are calendar days in UTC (YYYY-MM-DD); a range includes both ends.
 */
import { z } from 'zod';
import { INSTALL_TYPES, SYMPTOMS } from '@/trees/tree-format';
import { WALK_OUTCOMES } from './walks';

/** Longest range one request may cover, in days (about three years). */
export const MAX_RANGE_DAYS = 1100;
/** Default range when none is given: the last 26 weeks up to today. */
export const DEFAULT_RANGE_DAYS = 182;
/** At most this many walks come back from a drill-down (the CSV export has them all). */
export const DRILL_LIMIT = 200;
/** At most this many comeback pairs come back in the report (the CSV export has them all). */
export const COMEBACK_LIMIT = 200;

// Query strings send '' for a cleared picker: treat it as "not set".
const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

const isoDay = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Give the date as YYYY-MM-DD.')
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), {
    message: 'That date does not exist.',
  });

const positiveId = (what: string) => z.coerce.number({ message: `Pick a ${what} from the list.` }).int(`Pick a ${what} from the list.`).positive(`Pick a ${what} from the list.`).max(2 ** 31);

/** The filter fields every Patterns request takes; all optional. */
export const patternFilterFields = {
  from: z.preprocess(blankToUndefined, isoDay.optional()),
  to: z.preprocess(blankToUndefined, isoDay.optional()),
  installType: z.preprocess(blankToUndefined, z.enum(INSTALL_TYPES, { message: `Choose an install type from the list (${INSTALL_TYPES.join(', ')}).` }).optional()),
  treeId: z.preprocess(blankToUndefined, positiveId('tree').optional()),
  make: z.preprocess(blankToUndefined, z.string().trim().max(60, 'Keep the make under 60 characters.').optional()),
  engine: z.preprocess(blankToUndefined, z.string().trim().max(80, 'Keep the engine under 80 characters.').optional()),
  techId: z.preprocess(blankToUndefined, positiveId('technician').optional()),
};

type RangeInput = { from?: string; to?: string };
function checkRange(f: RangeInput, ctx: z.RefinementCtx) {
  if (f.from && f.to) {
    const days = (Date.parse(`${f.to}T00:00:00Z`) - Date.parse(`${f.from}T00:00:00Z`)) / 86_400_000;
    if (days < 0) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The end date is before the start date.' });
    else if (days >= MAX_RANGE_DAYS) ctx.addIssue({ code: 'custom', path: ['from'], message: `Pick a range shorter than ${MAX_RANGE_DAYS} days.` });
  }
}

/** Query of GET /api/patterns and of the CSV exports. */
export const patternFiltersSchema = z.object(patternFilterFields).superRefine(checkRange);
export type PatternFilters = z.infer<typeof patternFiltersSchema>;

/** What a drill-down asks for: the walks behind one number of the report. */
export const DRILL_MEASURES = ['finished', 'cause', 'unresolved', 'timed', 'week'] as const;
export type DrillMeasure = (typeof DRILL_MEASURES)[number];

/** Query of GET /api/patterns/walks. */
export const patternDrillSchema = z
  .object({
    ...patternFilterFields,
    measure: z.enum(DRILL_MEASURES, { message: `Say which figure to open (${DRILL_MEASURES.join(', ')}).` }),
    code: z.preprocess(blankToUndefined, z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Name the cause by its code.').max(64).optional()),
    outcome: z.preprocess(blankToUndefined, z.enum(['referred', 'not_fixed'], { message: 'Choose referred or not_fixed.' }).optional()),
    week: z.preprocess(blankToUndefined, isoDay.optional()),
  })
  .superRefine((q, ctx) => {
    checkRange(q, ctx);
    if (q.measure === 'cause' && !q.code) ctx.addIssue({ code: 'custom', path: ['code'], message: 'Say which cause to open.' });
    if (q.measure === 'week' && !q.week) ctx.addIssue({ code: 'custom', path: ['week'], message: 'Say which week to open (its Monday, YYYY-MM-DD).' });
  });
export type PatternDrillQuery = z.infer<typeof patternDrillSchema>;

/** Tables the CSV export can stream. */
export const EXPORT_TABLES = ['causes', 'repeats', 'comebacks', 'unresolved', 'times', 'weeks', 'walks'] as const;
export type ExportTable = (typeof EXPORT_TABLES)[number];

const appliedFilters = z.object({
  from: z.string(),
  to: z.string(),
  installType: z.enum(INSTALL_TYPES).nullable(),
  treeId: z.number().nullable(),
  make: z.string().nullable(),
  engine: z.string().nullable(),
  techId: z.number().nullable(),
});
export type AppliedFilters = z.infer<typeof appliedFilters>;

export const causeRowSchema = z.object({
  code: z.string(),
  title: z.string(),
  walks: z.number(),
  /** Walks that found this cause, as a share (0–1) of all finished walks in the range. */
  share: z.number(),
});
export type CauseRow = z.infer<typeof causeRowSchema>;

export const repeatRowSchema = z.object({
  installType: z.enum(INSTALL_TYPES),
  code: z.string(),
  title: z.string(),
  /** Different jobs with this install type where the cause was found (at least two). */
  jobs: z.number(),
  walks: z.number(),
  lastFoundAt: z.string(),
});
export type RepeatRow = z.infer<typeof repeatRowSchema>;

const comebackWalk = z.object({
  walkId: z.number(),
  jobId: z.number(),
  roNumber: z.string(),
  treeTitle: z.string(),
  symptom: z.enum(SYMPTOMS),
  causeCode: z.string().nullable(),
  causeTitle: z.string().nullable(),
  at: z.string(),
});

export const comebackRowSchema = z.object({
  vin: z.string(),
  vehicle: z.string(),
  /** The walk closed as fixed. */
  first: comebackWalk,
  /** The walk on the same vehicle within the comeback window. */
  again: comebackWalk,
  /** Whole days from the first walk closing to the second starting. */
  days: z.number(),
  sameSymptom: z.boolean(),
  sameCause: z.boolean(),
});
export type ComebackRow = z.infer<typeof comebackRowSchema>;

export const unresolvedRowSchema = z.object({
  treeId: z.number(),
  treeTitle: z.string(),
  finished: z.number(),
  referred: z.number(),
  notFixed: z.number(),
  /** (referred + not fixed) / finished. */
  share: z.number(),
});
export type UnresolvedRow = z.infer<typeof unresolvedRowSchema>;

export const timeRowSchema = z.object({
  treeId: z.number(),
  treeTitle: z.string(),
  /** Finished walks that ended at a cause step. */
  walks: z.number(),
  medianTimeS: z.number(),
  p90TimeS: z.number(),
  medianSteps: z.number(),
  p90Steps: z.number(),
});
export type TimeRow = z.infer<typeof timeRowSchema>;

export const weekRowSchema = z.object({
  /** The Monday the week starts on (UTC). */
  week: z.string(),
  finished: z.number(),
  withCause: z.number(),
  fixed: z.number(),
  notFixed: z.number(),
  referred: z.number(),
  /** Walks closed as fixed that week whose vehicle came back within the window. */
  cameBack: z.number(),
});
export type WeekRow = z.infer<typeof weekRowSchema>;

/** GET /api/patterns: every measure for the filters. */
export const patternReportSchema = z.object({
  filters: appliedFilters,
  windowDays: z.number(),
  totals: z.object({
    finished: z.number(),
    withCause: z.number(),
    fixed: z.number(),
    notFixed: z.number(),
    referred: z.number(),
    /** Fixed walks whose vehicle came back within the window. */
    cameBack: z.number(),
    /** Comeback pairs (a fixed walk and a later walk on the same vehicle). */
    comebacks: z.number(),
  }),
  causes: z.array(causeRowSchema),
  repeats: z.array(repeatRowSchema),
  comebacks: z.array(comebackRowSchema),
  unresolved: z.array(unresolvedRowSchema),
  times: z.array(timeRowSchema),
  weeks: z.array(weekRowSchema),
});
export type PatternReport = z.infer<typeof patternReportSchema>;

/** GET /api/patterns/options: what the filter pickers offer. */
export const patternOptionsSchema = z.object({
  trees: z.array(z.object({ id: z.number(), title: z.string() })),
  makes: z.array(z.string()),
  engines: z.array(z.string()),
  techs: z.array(z.object({ id: z.number(), name: z.string() })),
  windowDays: z.number(),
});
export type PatternOptions = z.infer<typeof patternOptionsSchema>;

/** One walk behind a number. */
export const patternWalkSchema = z.object({
  id: z.number(),
  jobId: z.number(),
  roNumber: z.string(),
  vin: z.string().nullable(),
  vehicle: z.string(),
  treeId: z.number(),
  treeTitle: z.string(),
  outcome: z.enum(WALK_OUTCOMES).nullable(),
  causeCode: z.string().nullable(),
  causeText: z.string().nullable(),
  techName: z.string().nullable(),
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
  steps: z.number(),
  timeSpentS: z.number().nullable(),
});
export type PatternWalk = z.infer<typeof patternWalkSchema>;

export const patternDrillAnswerSchema = z.object({ items: z.array(patternWalkSchema), total: z.number(), limit: z.number() });
export type PatternDrillAnswer = z.infer<typeof patternDrillAnswerSchema>;
