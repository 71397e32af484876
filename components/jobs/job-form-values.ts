import type { InstallChange, Job, JobInput } from '@/shared/schemas/jobs';
import { checkVin } from '@/shared/vin';

/** What the job form's fields hold: text as typed. */
export interface JobFormValues extends Record<string, unknown> {
  roNumber: string;
  customerName: string;
  vin: string;
  vinOverride: boolean;
  year: string;
  make: string;
  model: string;
  engine: string;
  mileage: string;
  install: InstallChange[];
  notes: string;
}

/** Empty fields for a new job, or an existing job's values. */
export function jobFormValues(job?: Job): JobFormValues {
  return {
    roNumber: job?.roNumber ?? '',
    customerName: job?.customerName ?? '',
    vin: job?.vin ?? '',
    vinOverride: job?.vinOverride ?? false,
    year: job?.year ? String(job.year) : '',
    make: job?.make ?? '',
    model: job?.model ?? '',
    engine: job?.engine ?? '',
    mileage: job?.mileage !== null && job?.mileage !== undefined ? String(job.mileage) : '',
    install: job?.install ?? [],
    notes: job?.notes ?? '',
  };
}

/** A whole number from a field ("142,300" and "142 300" included); NaN when it is not one, so the schema explains. */
function whole(text: string): number | null {
  const t = text.trim().replace(/[\s,_]/g, '');
  if (!t) return null;
  return /^-?\d+$/.test(t) ? Number(t) : Number.NaN;
}

/** Field text to the API's job input (the shared schema checks it on both sides). */
export function toJobInput(v: JobFormValues): JobInput {
  const check = checkVin(v.vin);
  return {
    roNumber: v.roNumber,
    customerName: v.customerName,
    vin: check.vin || null,
    // The override only means something while the VIN fails its check.
    vinOverride: v.vinOverride && check.status !== 'valid',
    year: whole(v.year),
    make: v.make,
    model: v.model,
    engine: v.engine,
    mileage: whole(v.mileage),
    install: v.install,
    notes: v.notes,
  };
}
