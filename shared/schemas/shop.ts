import { z } from 'zod';
import { PRESSURE_UNITS } from '../readings/reading-kinds';

/** Lowest and highest shop altitude accepted, in metres (below the Dead Sea shore to above any town with a road). */
export const ALTITUDE_MIN_M = -450;
export const ALTITUDE_MAX_M = 5500;

/** A shop's settings as the API answers them; the client uses altitude and unit as defaults elsewhere. */
export const shopSchema = z.object({
  id: z.number(),
  name: z.string(),
  altitudeM: z.number(),
  pressureUnit: z.enum(PRESSURE_UNITS),
  comebackWindowDays: z.number(),
});
export type Shop = z.infer<typeof shopSchema>;

export const shopNameSchema = z
  .string()
  .trim()
  .min(2, 'Enter the shop name (at least 2 characters).')
  .max(120, 'Use at most 120 characters.');

/** PUT /api/shop body (owner only). */
export const shopSettingsSchema = z.object({
  name: shopNameSchema,
  altitudeM: z
    .number({ message: 'Enter the altitude as a number.' })
    .int('Round the altitude to whole metres.')
    .min(ALTITUDE_MIN_M, `The altitude must be at least ${ALTITUDE_MIN_M} m.`)
    .max(ALTITUDE_MAX_M, `The altitude must be at most ${ALTITUDE_MAX_M} m.`),
  pressureUnit: z.enum(PRESSURE_UNITS, { message: 'Pick a pressure unit from the list.' }),
  comebackWindowDays: z
    .number({ message: 'Enter the number of days.' })
    .int('Use whole days.')
    .min(1, 'Use at least 1 day.')
    .max(365, 'Use at most 365 days.'),
});
export type ShopSettings = z.infer<typeof shopSettingsSchema>;

export const shopAnswerSchema = z.object({ shop: shopSchema });
export type ShopAnswer = z.infer<typeof shopAnswerSchema>;
