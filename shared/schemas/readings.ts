/**
 * POST /api/readings/check: request shape, checked by the server at the edge
 * and by the Readings form. The zod layer checks shape and types; whether a
 * value is physically possible (a vacuum deeper than the air pressure, a trim
 * no engine computer can report) is the readings check's own ReadingError,
 * which names the same field paths.
 */
import { z } from 'zod';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS, PRESSURE_UNITS } from '../readings/reading-kinds';
import { LENGTH_UNITS } from '../readings/units';
import type { ReadingsCheckResult } from '../readings/readings-check';

const number = (what: string) => z.number({ message: `Enter ${what} as a number.` }).refine(Number.isFinite, `Enter ${what} as a finite number.`);

const pressureReadingSchema = (what: string) =>
  z.object({
    value: number(what),
    unit: z.enum(PRESSURE_UNITS, { message: `Pick a pressure unit: ${PRESSURE_UNITS.join(', ')}.` }),
  });

const trimPairSchema = z.object({
  shortPct: number('the short term trim'),
  longPct: number('the long term trim'),
});

const bankTrimsSchema = z.object({
  idle: trimPairSchema.optional(),
  at2500: trimPairSchema.optional(),
});

export const readingsCheckRequestSchema = z
  .object({
    /** Vacuum read on a gauge (a difference below the air pressure). */
    vacuum: pressureReadingSchema('the vacuum').optional(),
    /** Or manifold absolute pressure from a scan tool. */
    map: pressureReadingSchema('the MAP').optional(),
    /** A measured barometric pressure wins over the altitude. */
    baro: pressureReadingSchema('the barometric pressure').optional(),
    altitude: z
      .object({
        value: number('the altitude'),
        unit: z.enum(LENGTH_UNITS, { message: 'Pick m or ft for the altitude.' }),
      })
      .optional(),
    profile: z.enum(ENGINE_PROFILES, { message: `Pick an engine profile: ${ENGINE_PROFILES.join(', ')}.` }).default('stock'),
    needle: z.enum(NEEDLE_BEHAVIOURS, { message: `Pick what the needle did: ${NEEDLE_BEHAVIOURS.join(', ')}.` }).optional(),
    trims: z.object({ bank1: bankTrimsSchema.optional(), bank2: bankTrimsSchema.optional() }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.vacuum && v.map) {
      ctx.addIssue({ code: 'custom', path: ['map'], message: 'Enter either a vacuum reading or a MAP reading, not both.' });
    }
    const anyTrim = !!(v.trims?.bank1?.idle || v.trims?.bank1?.at2500 || v.trims?.bank2?.idle || v.trims?.bank2?.at2500);
    if (!v.vacuum && !v.map && !anyTrim) {
      ctx.addIssue({ code: 'custom', path: ['vacuum'], message: 'Enter an idle vacuum or MAP reading, or fuel trims for at least one bank.' });
    }
  });

/** What a client sends (profile may be left out: stock). */
export type ReadingsCheckRequest = z.input<typeof readingsCheckRequestSchema>;
/** What the server holds after validation. */
export type ReadingsCheckParsed = z.output<typeof readingsCheckRequestSchema>;
/** The answer: the same judgement the screen computes in the browser. */
export type ReadingsCheckAnswer = ReadingsCheckResult;
