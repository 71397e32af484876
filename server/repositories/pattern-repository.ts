import type { Readable } from 'node:stream';
import type { Knex } from 'knex';
import {
  causesQuery,
  comebacksQuery,
  drillCountQuery,
  drillQuery,
  repeatsQuery,
  timesQuery,
  totalsQuery,
  unresolvedQuery,
  weeksQuery,
  type DrillSpec,
  type PatternScope,
} from './pattern-queries';

export type { DrillSpec, PatternScope } from './pattern-queries';

// mysql2 returns SUM() and COUNT(DISTINCT) as strings (DECIMAL / BIGINT); the service turns them into numbers.
type Num = number | string | null;

export interface TotalsRow { finished: Num; with_cause: Num; fixed: Num; not_fixed: Num; referred: Num }
export interface CauseCountRow { cause_code: string; walks: Num }
export interface RepeatCountRow { install_type: string; cause_code: string; jobs: Num; walks: Num; last_found_at: Date }
export interface ComebackPairRow {
  vin: string;
  vehicle_year: number | null;
  make: string | null;
  model: string | null;
  a_id: number; a_job_id: number; a_ro: string; a_tree: string; a_symptom: string; a_cause: string | null; a_cause_text: string | null; a_at: Date;
  b_id: number; b_job_id: number; b_ro: string; b_tree: string; b_symptom: string; b_cause: string | null; b_cause_text: string | null; b_at: Date;
}
export interface UnresolvedCountRow { tree_id: number; title: string; finished: Num; referred: Num; not_fixed: Num }
export interface TimeStatsRow { tree_id: number; title: string; walks: Num; median_time: Num; p90_time: Num; median_steps: Num; p90_steps: Num }
export interface WeekCountRow { week_no: Num; finished: Num; with_cause: Num; fixed: Num; not_fixed: Num; referred: Num }
export interface DrillWalkRow {
  id: number; job_id: number; ro_number: string; vin: string | null; vehicle_year: number | null; make: string | null; model: string | null; engine: string | null;
  tree_id: number; tree_title: string; outcome: 'fixed' | 'not_fixed' | 'referred' | null; cause_code: string | null; cause_text: string | null;
  tech_name: string | null; started_at: Date; finished_at: Date | null; step_count: number; time_spent_s: number | null;
}

const parseJson = (v: unknown) => (typeof v === 'string' ? JSON.parse(v) : v);

/** Read-only queries behind the Patterns screen; every one is scoped by shop. */
export function createPatternRepository(knex: Knex) {
  return {
    /** The shop's comeback window in days. */
    async windowDays(shopId: number): Promise<number> {
      const row = await knex('shops').where({ id: shopId }).first('comeback_window_days');
      return Number(row?.comeback_window_days ?? 30);
    },

    totals: (s: PatternScope): Promise<TotalsRow> => totalsQuery(knex, s),
    causes: (s: PatternScope): Promise<CauseCountRow[]> => causesQuery(knex, s),
    repeats: (s: PatternScope): Promise<RepeatCountRow[]> => repeatsQuery(knex, s),
    comebacks: (s: PatternScope, windowDays: number): Promise<ComebackPairRow[]> => comebacksQuery(knex, s, windowDays),
    unresolved: (s: PatternScope): Promise<UnresolvedCountRow[]> => unresolvedQuery(knex, s),
    times: (s: PatternScope): Promise<TimeStatsRow[]> => timesQuery(knex, s),
    weeks: (s: PatternScope, firstMonday: Date): Promise<WeekCountRow[]> => weeksQuery(knex, s, firstMonday),

    async drill(s: PatternScope, d: DrillSpec, limit: number): Promise<{ rows: DrillWalkRow[]; total: number }> {
      const [rows, count] = await Promise.all([drillQuery(knex, s, d).limit(limit), drillCountQuery(knex, s, d)]);
      return { rows, total: Number(count?.n ?? 0) };
    },

    /**
     * Rows of a table as an object stream straight from the database, for the
     * CSV export: nothing is gathered in memory however many rows there are.
     */
    stream(table: 'causes' | 'repeats' | 'comebacks' | 'unresolved' | 'times' | 'weeks' | 'walks', s: PatternScope, extra: { windowDays: number; firstMonday: Date }): Readable {
      const builders = {
        causes: () => causesQuery(knex, s),
        repeats: () => repeatsQuery(knex, s),
        comebacks: () => comebacksQuery(knex, s, extra.windowDays),
        unresolved: () => unresolvedQuery(knex, s),
        times: () => timesQuery(knex, s),
        weeks: () => weeksQuery(knex, s, extra.firstMonday),
        walks: () => drillQuery(knex, s, { measure: 'finished' }),
      };
      return builders[table]().stream();
    },

    /** Cause titles by code, from the documents of the versions the shop's walks were pinned to and its published ones. */
    async causeTitles(shopId: number): Promise<Map<string, string>> {
      const rows: Array<{ doc: unknown }> = await knex('tree_versions as v')
        .where('v.shop_id', shopId)
        .whereIn('v.id', (q) =>
          q.select('published_version_id').from('trees').where('shop_id', shopId).whereNotNull('published_version_id'),
        )
        .select('v.doc');
      const titles = new Map<string, string>();
      for (const { doc } of rows) {
        const states = (parseJson(doc) as { machine?: { states?: Record<string, { meta?: { kind?: string; title?: string; cause?: { code?: string } } }> } })?.machine?.states ?? {};
        for (const state of Object.values(states)) {
          const code = state.meta?.kind === 'cause' ? state.meta.cause?.code : undefined;
          if (code && state.meta?.title && !titles.has(code)) titles.set(code, state.meta.title);
        }
      }
      return titles;
    },

    /** What the filter pickers offer: trees, makes and engines on the shop's jobs, and the people who walk. */
    async options(shopId: number) {
      const [trees, makes, engines, techs] = await Promise.all([
        knex('trees').where({ shop_id: shopId }).orderBy('title').select('id', 'title'),
        knex('jobs').where({ shop_id: shopId }).whereNotNull('make').where('make', '<>', '').distinct('make').orderBy('make').limit(300),
        knex('jobs').where({ shop_id: shopId }).whereNotNull('engine').where('engine', '<>', '').distinct('engine').orderBy('engine').limit(300),
        knex('users').where({ shop_id: shopId }).whereIn('role', ['owner', 'lead', 'tech']).orderBy('name').select('id', 'name'),
      ]);
      return {
        trees: trees as Array<{ id: number; title: string }>,
        makes: (makes as Array<{ make: string }>).map((r) => r.make),
        engines: (engines as Array<{ engine: string }>).map((r) => r.engine),
        techs: techs as Array<{ id: number; name: string }>,
      };
    },
  };
}

export type PatternRepository = ReturnType<typeof createPatternRepository>;
