/**
 * Baywalk's tree format (format tag "baywalk-tree/1"), defined once here and
 * used by the engine, the validator, the API, the editor and import/export.
 *
 * A tree document wraps an xstate v5 machine config. Each state is a step and
 * carries its step data in `meta`. Answers are events: an `ask` step's
 * transitions are keyed by answer event types (`answer.<slug>`), each with a
 * `description` that is the answer's label. A `reading` step has one event,
 * `reading`, whose transitions are guarded by the parameterised guard
 * `{ type: 'verdict', params: { is: <verdict> } }`. An `action` step has one
 * event, `done`. `cause` and `refer` steps are `type: 'final'`.
 * See trees/FORMAT.md for a worked example.
 */
import { z } from 'zod';
import { VERDICTS, readingParamsSchema } from '@/shared/readings/reading-kinds';

export const TREE_FORMAT = 'baywalk-tree/1' as const;

export const SYMPTOMS = [
  'lean_code',
  'high_or_hunting_idle',
  'rough_idle_or_misfire',
  'hard_brake_pedal',
  'hard_start_or_low_fuel_pressure',
  'throttle_fault_reduced_power',
  'hiss_at_idle',
  'other',
] as const;
export type Symptom = (typeof SYMPTOMS)[number];

export const SYMPTOM_LABELS: Record<Symptom, string> = {
  lean_code: 'Lean code or high positive fuel trims',
  high_or_hunting_idle: 'High or hunting idle',
  rough_idle_or_misfire: 'Rough idle or misfire',
  hard_brake_pedal: 'Hard brake pedal or weak assist',
  hard_start_or_low_fuel_pressure: 'Hard start, stalling or low fuel pressure',
  throttle_fault_reduced_power: 'Electronic throttle fault or reduced power',
  hiss_at_idle: 'Hiss or whistle at idle',
  other: 'Other',
};

export const INSTALL_TYPES = [
  'intake_manifold',
  'throttle_body',
  'throttle_body_adapter',
  'camshaft',
  'fuel_system_conversion',
  'sensor_relocation',
  'other',
] as const;
export type InstallType = (typeof INSTALL_TYPES)[number];

export const INSTALL_TYPE_LABELS: Record<InstallType, string> = {
  intake_manifold: 'Intake manifold',
  throttle_body: 'Throttle body',
  throttle_body_adapter: 'Throttle-body adapter',
  camshaft: 'Camshaft',
  fuel_system_conversion: 'Fuel-system conversion',
  sensor_relocation: 'Sensor moved or changed',
  other: 'Other',
};

/** Hazards a caution can name; the walk screen shows an icon and the word for each. */
export const HAZARDS = ['fuel_pressure', 'hot_parts', 'moving_parts', 'exhaust_gas', 'fire', 'electrical', 'vehicle_support', 'chemicals', 'eye_protection'] as const;
export type Hazard = (typeof HAZARDS)[number];

/** The word shown beside each hazard's icon. */
export const HAZARD_LABELS: Record<Hazard, string> = {
  fuel_pressure: 'Fuel under pressure',
  hot_parts: 'Hot parts',
  moving_parts: 'Moving parts',
  exhaust_gas: 'Exhaust gas',
  fire: 'Fire risk',
  electrical: 'Electrical',
  vehicle_support: 'Vehicle support',
  chemicals: 'Chemicals',
  eye_protection: 'Eye protection',
};

export const STEP_KINDS = ['ask', 'reading', 'action', 'cause', 'refer'] as const;
export type StepKind = (typeof STEP_KINDS)[number];

/** The word shown beside each step kind's icon. */
export const STEP_KIND_LABELS: Record<StepKind, string> = {
  ask: 'Ask',
  reading: 'Reading',
  action: 'Action',
  cause: 'Cause',
  refer: 'Refer',
};

/** Step ids and event slugs: lower-case words joined by hyphens. */
const stepId = z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lower-case letters, digits and hyphens, like "check-pcv-hose".').max(64);
export const ANSWER_EVENT = /^answer\.[a-z0-9]+(?:-[a-z0-9]+)*$/;

export const cautionSchema = z.object({
  hazard: z.enum(HAZARDS),
  text: z.string().min(1, 'Write what to watch out for.').max(400),
});

const baseMeta = {
  title: z.string().min(1, 'Give the step a title.').max(120, 'Keep the title under 120 characters.'),
  body: z.string().max(8000, 'Keep the text under 8000 characters.').default(''),
  cautions: z.array(cautionSchema).max(8).default([]),
  photoPrompts: z.array(z.string().min(1).max(200)).max(6).default([]),
};

export const stepMetaSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('ask'), ...baseMeta }),
  z.object({ kind: z.literal('reading'), ...baseMeta, reading: readingParamsSchema }),
  z.object({ kind: z.literal('action'), ...baseMeta }),
  z.object({
    kind: z.literal('cause'),
    ...baseMeta,
    cause: z.object({
      code: stepId.describe('a stable id for the cause, counted across jobs'),
      area: z.string().min(1, 'Name the part or area.').max(120),
      fix: z.string().min(1, 'Say how to fix it.').max(2000),
    }),
  }),
  z.object({
    kind: z.literal('refer'),
    ...baseMeta,
    refer: z.object({
      to: z.string().min(1, 'Say who to hand over to.').max(120),
      reason: z.string().min(1, 'Say why.').max(1000),
    }),
  }),
], { message: 'Set "kind" to ask, reading, action, cause or refer.' });
export type StepMeta = z.infer<typeof stepMetaSchema>;

const verdictValues = [...new Set(Object.values(VERDICTS).flat())] as [string, ...string[]];

export const transitionSchema = z.object({
  target: stepId,
  /** For answers: the label on the button. */
  description: z.string().min(1).max(120).optional(),
  /** For reading steps: which verdict takes this branch. */
  guard: z
    .object({
      type: z.literal('verdict', { message: 'A branch is chosen by the reading\'s verdict only: use "type": "verdict".' }),
      params: z.object({ is: z.enum(verdictValues, { message: `Use a verdict the readings check gives: ${verdictValues.join(', ')}.` }) }),
    })
    .optional(),
});
export type TransitionDef = z.infer<typeof transitionSchema>;

export const stateSchema = z.object({
  type: z.literal('final').optional(),
  meta: stepMetaSchema,
  on: z.record(z.string(), z.union([transitionSchema, z.array(transitionSchema).min(1)])).optional(),
});
export type StateDef = z.infer<typeof stateSchema>;

export const treeDocSchema = z.object({
  format: z.literal(TREE_FORMAT),
  id: stepId,
  title: z.string().min(1).max(140),
  symptom: z.enum(SYMPTOMS),
  installTypes: z.array(z.enum(INSTALL_TYPES)).min(1),
  summary: z.string().max(1000).default(''),
  machine: z.object({
    id: stepId,
    initial: stepId,
    states: z.record(stepId, stateSchema),
  }),
});
export type TreeDoc = z.infer<typeof treeDocSchema>;
