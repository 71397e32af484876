/**
 * The contract between trees and the readings check: which kinds of reading a
 * tree step may ask for, which verdicts each can give, and the parameters a
 * step supplies. Trees branch on these verdicts; the validator checks that a
 * reading step covers every verdict listed here.
 */
import { z } from 'zod';

export const ENGINE_PROFILES = ['stock', 'mild_cam', 'long_duration_cam'] as const;
export type EngineProfile = (typeof ENGINE_PROFILES)[number];

export const NEEDLE_BEHAVIOURS = [
  'steady',
  'floating',
  'dropping_regularly',
  'dropping_now_and_then',
  'sinking_at_2500',
  'fluttering',
] as const;
export type NeedleBehaviour = (typeof NEEDLE_BEHAVIOURS)[number];

export const PRESSURE_UNITS = ['kPa', 'Pa', 'inHg', 'psi', 'mmHg', 'inH2O', 'bar'] as const;
export type PressureUnit = (typeof PRESSURE_UNITS)[number];

/** Verdicts per reading kind. Order is display order. */
export const VERDICTS = {
  /** Idle manifold vacuum judged against the engine profile at the shop's altitude. */
  idle_vacuum: ['within_range', 'low', 'very_low', 'high'],
  /** Total fuel trim (short + long term) of one bank at one engine speed, in percent. */
  fuel_trim: ['normal', 'lean', 'rich', 'code_lean', 'code_rich'],
  /** A plain measured value against a min/max band set by the tree step (fuel pressure, volts, rpm…). */
  range: ['below', 'within', 'above'],
} as const;

export type ReadingKind = keyof typeof VERDICTS;
export type Verdict<K extends ReadingKind = ReadingKind> = (typeof VERDICTS)[K][number];
export const READING_KINDS = Object.keys(VERDICTS) as ReadingKind[];

/** Parameters a tree step gives for each kind (the step's `reading` object). */
export const readingParamsSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('idle_vacuum'),
    /** Engine profile; when absent the walk asks, defaulting to stock. */
    profile: z.enum(ENGINE_PROFILES).optional(),
  }),
  z.object({
    kind: z.literal('fuel_trim'),
    rpm: z.enum(['idle', '2500']).default('idle'),
  }),
  z.object({
    kind: z.literal('range'),
    /** What is measured, shown to the technician: "Fuel rail pressure, key on engine off". */
    quantity: z.string().min(1).max(120),
    unit: z.string().min(1).max(16),
    min: z.number(),
    max: z.number(),
  }),
]);
export type ReadingParams = z.infer<typeof readingParamsSchema>;
