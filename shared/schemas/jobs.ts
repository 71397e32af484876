import { z } from 'zod';
import { optionalText } from './fields';
import { INSTALL_TYPES } from '@/trees/tree-format';
import { isVinCheckDigitValid, normalizeVin, VIN_LENGTH } from '../vin';

/** Latest model year a job may name: makers sell next year's models early. */
export const maxModelYear = () => new Date().getFullYear() + 2;

/** One change made in the install (an intake manifold, a throttle-body adapter…). */
export const installChangeSchema = z.object({
  type: z.enum(INSTALL_TYPES, { message: 'Pick what kind of change this was.' }),
  text: z.string().trim().max(200, 'Keep each change under 200 characters.').default(''),
});
export type InstallChange = z.infer<typeof installChangeSchema>;

/**
 * A job as created or edited. The VIN must pass the North American check digit
 * (49 CFR 565.15) unless `vinOverride` says the vehicle predates 1981 or was
 * built for another market; then any 1–17 letters and digits are kept.
 */
export const jobInputSchema = z
  .object({
    roNumber: z.string().trim().min(1, 'Enter the repair-order number.').max(40, 'Keep the RO number under 40 characters.'),
    customerName: z.string().trim().min(1, "Enter the customer's name.").max(120, 'Keep the name under 120 characters.'),
    vin: z
      .string()
      .nullish()
      .transform((v) => (v ? normalizeVin(v) : null)),
    vinOverride: z.boolean().default(false),
    year: z
      .number({ message: 'Enter the model year as a number.' })
      .int('Enter a whole year.')
      .min(1900, 'Enter a year from 1900 on.')
      .refine((y) => y <= maxModelYear(), { message: 'That model year is in the future.' })
      .nullish()
      .transform((v) => v ?? null),
    make: optionalText(60, 'Keep the make under 60 characters.'),
    model: optionalText(60, 'Keep the model under 60 characters.'),
    engine: optionalText(80, 'Keep the engine under 80 characters.'),
    mileage: z
      .number({ message: 'Enter the mileage as a number.' })
      .int('Enter whole miles or kilometres.')
      .min(0, 'Mileage cannot be negative.')
      .max(3_000_000, 'That mileage is too large.')
      .nullish()
      .transform((v) => v ?? null),
    install: z.array(installChangeSchema).max(30, 'List at most 30 changes.').default([]),
    notes: optionalText(4000, 'Keep the notes under 4000 characters.'),
  })
  .superRefine((job, ctx) => {
    const vin = job.vin;
    if (!vin) return;
    if (job.vinOverride) {
      if (!/^[A-Z0-9]{1,17}$/.test(vin)) ctx.addIssue({ code: 'custom', path: ['vin'], message: 'Use at most 17 letters and digits.' });
      return;
    }
    if (vin.length !== VIN_LENGTH) {
      ctx.addIssue({ code: 'custom', path: ['vin'], message: `A VIN has 17 characters; this has ${vin.length}. For an older vehicle, tick the override.` });
    } else if (!/^[0-9A-HJ-NPR-Z]+$/.test(vin)) {
      ctx.addIssue({ code: 'custom', path: ['vin'], message: 'A VIN never uses I, O or Q, or any sign other than letters and digits.' });
    } else if (!isVinCheckDigitValid(vin)) {
      ctx.addIssue({
        code: 'custom',
        path: ['vin'],
        message: 'The VIN check digit does not match. Check for a typo, or tick the override for a pre-1981 or non-North-American vehicle.',
      });
    }
  });
export type JobInput = z.input<typeof jobInputSchema>;
export type JobInputParsed = z.output<typeof jobInputSchema>;

export const jobListQuerySchema = z.object({
  q: z.string().trim().max(80, 'Search with fewer than 80 characters.').optional().default(''),
  page: z.coerce.number().int().min(1, 'Pages start at 1.').max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100, 'Ask for at most 100 jobs a page.').default(20),
});
/** What the client asks the job list for (the schema coerces query-string text). */
export type JobListQuery = { q?: string; page?: number; pageSize?: number };

/** A job as the API returns it. */
export const jobSchema = z.object({
  id: z.number(),
  roNumber: z.string(),
  customerName: z.string(),
  vin: z.string().nullable(),
  vinOverride: z.boolean(),
  year: z.number().nullable(),
  make: z.string().nullable(),
  model: z.string().nullable(),
  engine: z.string().nullable(),
  mileage: z.number().nullable(),
  install: z.array(installChangeSchema),
  notes: z.string().nullable(),
  createdBy: z.object({ id: z.number(), name: z.string() }).nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  openWalks: z.number(),
  walkCount: z.number(),
});
export type Job = z.infer<typeof jobSchema>;

export const jobAnswerSchema = z.object({ job: jobSchema });
export type JobAnswer = z.infer<typeof jobAnswerSchema>;

export const jobListSchema = z.object({
  items: z.array(jobSchema),
  page: z.number(),
  pageSize: z.number(),
  total: z.number(),
});
export type JobList = z.infer<typeof jobListSchema>;
