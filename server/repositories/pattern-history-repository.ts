import type { Knex } from 'knex';

const BATCH = 400;

export interface HistoryJobRow {
  ro_number: string; customer_name: string; vin: string; vehicle_year: number; make: string; model: string; engine: string;
  mileage: number; notes: string | null; created_by: number; created_at: Date; updated_at: Date;
  install: Array<{ type: string; text: string }>;
}
export interface HistoryWalkRow {
  job: number; tree_id: number; tree_version_id: number; altitude_m: number; started_by: number; status: 'open' | 'finished';
  current_step: string; step_count: number; outcome: string | null; cause_step: string | null; cause_code: string | null; cause_text: string | null;
  finish_note: string | null; finished_by: number | null; time_spent_s: number | null; started_at: Date; last_step_at: Date | null; finished_at: Date | null;
  steps: Array<{
    id: string; seq: number; kind: 'event' | 'undo'; event: unknown; undoes_step_id: string | null; from_step: string; to_step: string;
    verdict: string | null; reading_value: number | null; reading_unit: string | null; judgement: unknown; note: string | null; user_id: number; created_at: Date;
  }>;
}

/**
 * Writes a past history of jobs and walks for one shop in one transaction
 * (the demo shop's six months; browser tests seed a fresh shop the same way).
 * Rows go in many at a time so the whole history loads in well under a second.
 */
export function createPatternHistoryRepository(knex: Knex) {
  return {
    /** Inserts the jobs with their changes and the walks with their step records; returns the counts. */
    async insert(shopId: number, jobs: HistoryJobRow[], walks: HistoryWalkRow[]): Promise<{ jobs: number; walks: number; steps: number }> {
      return knex.transaction(async (trx) => {
        const jobRows = jobs.map(({ install: _install, ...j }) => ({ ...j, shop_id: shopId }));
        for (let i = 0; i < jobRows.length; i += BATCH) await trx('jobs').insert(jobRows.slice(i, i + BATCH));
        // Ids by repair-order number (unique per shop), so nothing depends on how ids are handed out.
        const ids = new Map<string, number>();
        for (const r of await trx('jobs').where({ shop_id: shopId }).whereIn('ro_number', jobs.map((j) => j.ro_number)).select('id', 'ro_number')) ids.set(r.ro_number, r.id);
        const jobId = (i: number) => ids.get(jobs[i].ro_number)!;
        const changes = jobs.flatMap((j, i) => j.install.map((c, position) => ({ job_id: jobId(i), shop_id: shopId, position, install_type: c.type, description: c.text })));
        for (let i = 0; i < changes.length; i += BATCH) await trx('job_changes').insert(changes.slice(i, i + BATCH));
        const steps: Array<Record<string, unknown>> = [];
        for (const { steps: walkSteps, job, ...w } of walks) {
          const [walkId] = await trx('walks').insert({ ...w, shop_id: shopId, job_id: jobId(job) });
          for (const s of walkSteps) {
            steps.push({ ...s, walk_id: walkId, shop_id: shopId, event: s.event === null ? null : JSON.stringify(s.event), judgement: s.judgement === null ? null : JSON.stringify(s.judgement) });
          }
        }
        for (let i = 0; i < steps.length; i += BATCH) await trx('walk_steps').insert(steps.slice(i, i + BATCH));
        return { jobs: jobs.length, walks: walks.length, steps: steps.length };
      });
    },

    /** The shop's published stock-library trees with their documents, and its people by role. */
    async shopFacts(shopId: number) {
      const [trees, people, shop] = await Promise.all([
        knex('trees as t')
          .join('tree_versions as v', 'v.id', 't.published_version_id')
          .where({ 't.shop_id': shopId, 't.status': 'active' })
          .select('t.id', 't.slug', 'v.id as version_id', 'v.doc'),
        knex('users').where({ shop_id: shopId, active: true }).whereIn('role', ['owner', 'lead', 'tech']).orderBy('id').select('id', 'role'),
        knex('shops').where({ id: shopId }).first('altitude_m'),
      ]);
      return {
        trees: trees as Array<{ id: number; slug: string; version_id: number; doc: unknown }>,
        people: people as Array<{ id: number; role: string }>,
        altitudeM: Number(shop?.altitude_m ?? 0),
      };
    },

    /** Whether the shop already has jobs (the history is only ever loaded into an empty shop). */
    async hasJobs(shopId: number): Promise<boolean> {
      return !!(await knex('jobs').where({ shop_id: shopId }).first('id'));
    },
  };
}
