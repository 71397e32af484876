import type { Knex } from 'knex';
import type { InstallChange, JobInputParsed } from '@/shared/schemas/jobs';

export interface JobRow {
  id: number;
  shop_id: number;
  ro_number: string;
  customer_name: string;
  vin: string | null;
  vin_override: number | boolean;
  vehicle_year: number | null;
  make: string | null;
  model: string | null;
  engine: string | null;
  mileage: number | null;
  notes: string | null;
  created_by: number | null;
  created_by_name: string | null;
  created_at: Date;
  updated_at: Date;
  open_walks: number | string;
  walk_count: number | string;
}

export interface JobRecord extends JobRow {
  install: InstallChange[];
}

// whereILike, not whereLike: knex adds COLLATE utf8_bin to whereLike, which utf8mb4 columns refuse.
/** Escapes LIKE wildcards so a search for "50%" finds the text, not everything. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

function toColumns(job: JobInputParsed) {
  return {
    ro_number: job.roNumber,
    customer_name: job.customerName,
    vin: job.vin,
    vin_override: job.vinOverride,
    vehicle_year: job.year,
    make: job.make,
    model: job.model,
    engine: job.engine,
    mileage: job.mileage,
    notes: job.notes,
  };
}

/** Jobs and their install changes; every query is scoped by shop. */
export function createJobRepository(knex: Knex) {
  // Jobs with the counts the list sorts by: open walks first.
  const selectJobs = (db: Knex, shopId: number) =>
    db('jobs')
      .leftJoin('users', 'users.id', 'jobs.created_by')
      .where('jobs.shop_id', shopId)
      .select(
        'jobs.*',
        'users.name as created_by_name',
        db.raw("(SELECT COUNT(*) FROM walks w WHERE w.job_id = jobs.id AND w.shop_id = jobs.shop_id AND w.status = 'open') AS open_walks"),
        db.raw('(SELECT COUNT(*) FROM walks w WHERE w.job_id = jobs.id AND w.shop_id = jobs.shop_id) AS walk_count'),
      );

  async function changesFor(db: Knex, shopId: number, jobIds: number[]): Promise<Map<number, InstallChange[]>> {
    const map = new Map<number, InstallChange[]>();
    if (!jobIds.length) return map;
    const rows = await db('job_changes').where({ shop_id: shopId }).whereIn('job_id', jobIds).orderBy(['job_id', 'position']);
    for (const r of rows as Array<{ job_id: number; install_type: InstallChange['type']; description: string }>) {
      const list = map.get(r.job_id) ?? [];
      list.push({ type: r.install_type, text: r.description });
      map.set(r.job_id, list);
    }
    return map;
  }

  async function writeChanges(trx: Knex, shopId: number, jobId: number, install: InstallChange[]) {
    await trx('job_changes').where({ shop_id: shopId, job_id: jobId }).delete();
    if (install.length) {
      await trx('job_changes').insert(
        install.map((c, position) => ({ job_id: jobId, shop_id: shopId, position, install_type: c.type, description: c.text })),
      );
    }
  }

  return {
    async findById(shopId: number, id: number, db: Knex = knex): Promise<JobRecord | undefined> {
      const row: JobRow | undefined = await selectJobs(db, shopId).andWhere('jobs.id', id).first();
      if (!row) return undefined;
      const changes = await changesFor(db, shopId, [id]);
      return { ...row, install: changes.get(id) ?? [] };
    },

    async roTaken(shopId: number, roNumber: string, exceptId?: number): Promise<boolean> {
      const q = knex('jobs').where({ shop_id: shopId, ro_number: roNumber });
      if (exceptId) q.whereNot('id', exceptId);
      return !!(await q.first('id'));
    },

    /** Creates a job with its changes in one transaction; returns its id. */
    async create(shopId: number, userId: number, job: JobInputParsed): Promise<number> {
      return knex.transaction(async (trx) => {
        const [id] = await trx('jobs').insert({ ...toColumns(job), shop_id: shopId, created_by: userId });
        await writeChanges(trx, shopId, id as number, job.install);
        return id as number;
      });
    },

    /** Rewrites a job and its change list; false when the job is not in this shop. */
    async update(shopId: number, id: number, job: JobInputParsed): Promise<boolean> {
      return knex.transaction(async (trx) => {
        const n = await trx('jobs')
          .where({ shop_id: shopId, id })
          .update({ ...toColumns(job), updated_at: trx.fn.now(3) });
        if (!n) return false;
        await writeChanges(trx, shopId, id, job.install);
        return true;
      });
    },

    /** One page of jobs matching a search, open walks first, then most recently changed. */
    async list(shopId: number, opts: { q: string; page: number; pageSize: number }): Promise<{ rows: JobRecord[]; total: number }> {
      const search = (qb: Knex.QueryBuilder) => {
        if (!opts.q) return;
        const term = `%${likeEscape(opts.q)}%`;
        const vinTerm = `%${likeEscape(opts.q.toUpperCase().replace(/[\s-]/g, ''))}%`;
        qb.andWhere((w) => w.whereILike('jobs.ro_number', term).orWhereILike('jobs.customer_name', term).orWhereILike('jobs.vin', vinTerm));
      };
      const countQuery = knex('jobs').where('jobs.shop_id', shopId).count<{ n: number }[]>({ n: '*' });
      search(countQuery);
      const [{ n }] = await countQuery;
      const listQuery = selectJobs(knex, shopId)
        .orderByRaw('open_walks > 0 DESC')
        .orderBy('jobs.updated_at', 'desc')
        .orderBy('jobs.id', 'desc')
        .limit(opts.pageSize)
        .offset((opts.page - 1) * opts.pageSize);
      search(listQuery);
      const rows: JobRow[] = await listQuery;
      const changes = await changesFor(knex, shopId, rows.map((r) => r.id));
      return { rows: rows.map((r) => ({ ...r, install: changes.get(r.id) ?? [] })), total: Number(n) };
    },
  };
}

export type JobRepository = ReturnType<typeof createJobRepository>;
