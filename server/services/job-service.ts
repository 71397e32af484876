import type { Knex } from 'knex';
import type { Job, JobInputParsed, JobList } from '@/shared/schemas/jobs';
import { decodeModelYear, isVinCheckDigitValid } from '@/shared/vin';
import { createJobRepository, type JobRecord } from '../repositories/job-repository';
import { conflict, notFound } from '../errors';

/** Turns a stored job into the API shape. */
export function toJob(r: JobRecord): Job {
  return {
    id: r.id,
    roNumber: r.ro_number,
    customerName: r.customer_name,
    vin: r.vin,
    vinOverride: !!r.vin_override,
    year: r.vehicle_year,
    make: r.make,
    model: r.model,
    engine: r.engine,
    mileage: r.mileage,
    install: r.install,
    notes: r.notes,
    createdBy: r.created_by ? { id: r.created_by, name: r.created_by_name ?? 'Former staff' } : null,
    createdAt: new Date(r.created_at).toISOString(),
    updatedAt: new Date(r.updated_at).toISOString(),
    openWalks: Number(r.open_walks),
    walkCount: Number(r.walk_count),
  };
}

/** When the year is left blank and the VIN is sound, take the year it encodes. */
function withDecodedYear(job: JobInputParsed): JobInputParsed {
  if (job.year !== null || !job.vin || !isVinCheckDigitValid(job.vin)) return job;
  return { ...job, year: decodeModelYear(job.vin)?.year ?? null };
}

const roTakenMessage = (ro: string) => `Repair order ${ro} is already a job in this shop. Open that job, or check the number.`;

/** Jobs: one vehicle visit each; repair-order numbers are unique within a shop. */
export function createJobService(knex: Knex) {
  const jobs = createJobRepository(knex);

  async function get(shopId: number, id: number): Promise<Job> {
    const row = await jobs.findById(shopId, id);
    if (!row) throw notFound('That job');
    return toJob(row);
  }

  return {
    get,
    async list(shopId: number, q: { q: string; page: number; pageSize: number }): Promise<JobList> {
      const { rows, total } = await jobs.list(shopId, q);
      return { items: rows.map(toJob), page: q.page, pageSize: q.pageSize, total };
    },
    async create(shopId: number, userId: number, input: JobInputParsed): Promise<Job> {
      // Checked first for a clear message; the unique index still guards a race (generic 409).
      if (await jobs.roTaken(shopId, input.roNumber)) throw conflict(roTakenMessage(input.roNumber), { fields: { roNumber: 'This RO number is already used.' } });
      const id = await jobs.create(shopId, userId, withDecodedYear(input));
      return get(shopId, id);
    },
    async update(shopId: number, id: number, input: JobInputParsed): Promise<Job> {
      if (!(await jobs.findById(shopId, id))) throw notFound('That job');
      if (await jobs.roTaken(shopId, input.roNumber, id)) throw conflict(roTakenMessage(input.roNumber), { fields: { roNumber: 'This RO number is already used.' } });
      await jobs.update(shopId, id, withDecodedYear(input));
      return get(shopId, id);
    },
  };
}
