import type { Knex } from 'knex';
import type { DrillMeasure } from '@/shared/schemas/patterns';
import type { InstallType } from '@/trees/tree-format';

/**
 * The SQL of every Patterns measure, as Knex builders. The repository runs or
 * streams them; scripts/patterns-bench.ts times them and prints their EXPLAIN.
 * Every builder is scoped to one shop, reads finished walks of jobs only
 * (guest walks have no job and are left out), and counts a walk in the range
 * by the moment it was finished. Times are compared as instants (no time
 * zone involved): weeks are cut with UNIX_TIMESTAMP, windows with INTERVAL.
 */
export interface PatternScope {
  shopId: number;
  /** First instant counted (midnight UTC of the first day). */
  start: Date;
  /** First instant no longer counted (midnight UTC after the last day). */
  end: Date;
  installType?: InstallType;
  treeId?: number;
  make?: string;
  engine?: string;
  techId?: number;
}

const WEEK_S = 7 * 86_400;

/** Limits a query that reads `walks as <alias>` to the scope: the shop, finished, in the range, on a job, and the filters. */
function applyScope(knex: Knex, q: Knex.QueryBuilder, s: PatternScope, alias: string): Knex.QueryBuilder {
  q.where(`${alias}.shop_id`, s.shopId)
    .where(`${alias}.status`, 'finished')
    .where(`${alias}.finished_at`, '>=', s.start)
    .where(`${alias}.finished_at`, '<', s.end)
    .whereNotNull(`${alias}.job_id`);
  if (s.treeId) q.where(`${alias}.tree_id`, s.treeId);
  if (s.techId) q.where(`${alias}.started_by`, s.techId);
  if (s.make || s.engine) {
    const j = `${alias}_job`;
    q.join(`jobs as ${j}`, `${j}.id`, `${alias}.job_id`).where(`${j}.shop_id`, s.shopId);
    if (s.make) q.where(`${j}.make`, s.make);
    if (s.engine) q.where(`${j}.engine`, s.engine);
  }
  if (s.installType) {
    q.whereExists((sub) =>
      sub
        .select(knex.raw('1'))
        .from('job_changes as jc_f')
        .whereRaw(`jc_f.job_id = ${alias}.job_id`)
        .where('jc_f.install_type', s.installType!)
        .where('jc_f.shop_id', s.shopId),
    );
  }
  return q;
}

/** Finished walks of jobs in the scope, as `w` (with the job joined only when a vehicle filter needs it). */
export const scopedWalks = (knex: Knex, s: PatternScope, alias = 'w'): Knex.QueryBuilder => applyScope(knex, knex(`walks as ${alias}`), s, alias);

/** Totals: finished walks, those ending at a cause, and each outcome. */
export const totalsQuery = (knex: Knex, s: PatternScope) =>
  scopedWalks(knex, s).first(
    knex.raw('COUNT(*) AS finished'),
    knex.raw('COALESCE(SUM(w.cause_code IS NOT NULL), 0) AS with_cause'),
    knex.raw("COALESCE(SUM(w.outcome = 'fixed'), 0) AS fixed"),
    knex.raw("COALESCE(SUM(w.outcome = 'not_fixed'), 0) AS not_fixed"),
    knex.raw("COALESCE(SUM(w.outcome = 'referred'), 0) AS referred"),
  );

/** Causes found: walks per cause code, most frequent first. */
export const causesQuery = (knex: Knex, s: PatternScope) =>
  scopedWalks(knex, s)
    .whereNotNull('w.cause_code')
    .groupBy('w.cause_code')
    .select('w.cause_code', knex.raw('COUNT(*) AS walks'))
    .orderBy([{ column: 'walks', order: 'desc' }, { column: 'w.cause_code' }]);

/**
 * Repeat causes: the same cause found on at least two different jobs that had
 * the same install type. A job with several install types counts under each.
 */
export const repeatsQuery = (knex: Knex, s: PatternScope) => {
  // The install-type filter is the join itself (jc keeps only that type), so the scope's EXISTS for it would only probe job_changes a second time.
  const scope = { ...s, installType: undefined };
  // Over a long range one install type's jobs are fewer than the walks: start from them, (shop, install type, job) index first.
  const fromInstalls = Boolean(s.installType) && rangeDays(s) > 300;
  const q = fromInstalls
    ? applyScope(knex, knex.from(knex.raw('?? USE INDEX (job_changes_shop_install_job_idx)', ['job_changes as jc'])).join('walks as w', 'w.job_id', 'jc.job_id'), scope, 'w')
    : // The (job_id, install_type, shop_id) index answers the join alone; left to itself the optimizer picks (job_id, position) and reads every row.
      scopedWalks(knex, scope).join(knex.raw('?? USE INDEX (job_changes_job_install_shop_idx)', ['job_changes as jc']), 'jc.job_id', 'w.job_id');
  q.where('jc.shop_id', s.shopId).whereNotNull('w.cause_code');
  if (s.installType) q.where('jc.install_type', s.installType);
  return q
    .groupBy('jc.install_type', 'w.cause_code')
    .havingRaw('COUNT(DISTINCT w.job_id) >= 2')
    .select(
      fromInstalls ? knex.raw('STRAIGHT_JOIN jc.install_type') : 'jc.install_type',
      'w.cause_code',
      knex.raw('COUNT(DISTINCT w.job_id) AS jobs'),
      knex.raw('COUNT(DISTINCT w.id) AS walks'),
      knex.raw('MAX(w.finished_at) AS last_found_at'),
    )
    .orderBy([{ column: 'jobs', order: 'desc' }, { column: 'walks', order: 'desc' }, { column: 'jc.install_type' }, { column: 'w.cause_code' }]);
};

/** Days in the scope's range. */
const rangeDays = (s: PatternScope) => (s.end.getTime() - s.start.getTime()) / 86_400_000;

/**
 * Whether comebacks start from the shop's returning VINs rather than from the
 * fixed walks in the scope. The VIN list costs the same for any range (one
 * pass over the shop's jobs), so it wins only over long ranges that no
 * technician or tree narrows (install type and vehicle filters narrow too
 * little). On 100 000 walks, returning VINs against fixed walks first:
 * 26 weeks 160 / 75 ms, one technician 120 / 23 ms; 104 weeks 241 / 289 ms,
 * with an install type 109 / 225 ms, one technician 153 / 111 ms.
 */
export const comebacksFromReturning = (s: PatternScope): boolean => rangeDays(s) > 300 && !s.techId && !s.treeId;

/**
 * Comebacks: a walk `a` closed as fixed in the scope, and a later walk `b` on
 * another job with the same VIN that started no later than `windowDays` after
 * `a` closed, for the same symptom (the trees' symptom) or ending at the same
 * cause. Each pair is a row; the filters apply to the fixed walk.
 *
 * Two join orders give the same rows; which is cheaper depends on the scope
 * (see comebacksFromReturning).
 */
export const comebacksQuery = (knex: Knex, s: PatternScope, windowDays: number, fromReturning = comebacksFromReturning(s)) => {
  let q: Knex.QueryBuilder;
  if (fromReturning) {
    // Only VINs on two or more jobs can come back: start from those (STRAIGHT_JOIN keeps that order), so the work follows returning cars, not the range.
    const returning = knex('jobs').where('shop_id', s.shopId).whereNotNull('vin').where('vin', '<>', '').groupBy('vin').havingRaw('COUNT(*) > 1').select('vin');
    q = knex
      .from(returning.as('rv'))
      .join('jobs as ja', function () {
        this.on('ja.vin', '=', 'rv.vin').andOnVal('ja.shop_id', '=', s.shopId);
      })
      .join('walks as a', 'a.job_id', 'ja.id');
  } else {
    // Start from the fixed walks in the scope (walks_patterns_idx) and look forward by (shop, VIN); the optimizer keeps that order.
    q = knex
      .from('walks as a')
      .join('jobs as ja', function () {
        this.on('ja.id', '=', 'a.job_id').andOnVal('ja.shop_id', '=', s.shopId).andOnVal('ja.vin', '<>', '');
      });
  }
  applyScope(knex, q, s, 'a');
  q.where('a.outcome', 'fixed')
    .join('jobs as jb', function () {
      this.on('jb.vin', '=', 'ja.vin').andOnVal('jb.shop_id', '=', s.shopId).andOn('jb.id', '<>', 'ja.id');
    })
    .join('walks as b', function () {
      this.on('b.job_id', '=', 'jb.id').andOnVal('b.shop_id', '=', s.shopId);
    })
    .join('trees as ta', 'ta.id', 'a.tree_id')
    .join('trees as tb', 'tb.id', 'b.tree_id')
    .whereRaw('b.started_at > a.finished_at')
    .whereRaw('b.started_at <= a.finished_at + INTERVAL ? DAY', [windowDays])
    .where((w) => w.whereRaw('tb.symptom = ta.symptom').orWhereRaw('(b.cause_code IS NOT NULL AND b.cause_code = a.cause_code)'))
    .select(
      fromReturning ? knex.raw('STRAIGHT_JOIN ja.vin') : 'ja.vin',
      'ja.vehicle_year',
      'ja.make',
      'ja.model',
      'a.id as a_id',
      'a.job_id as a_job_id',
      'ja.ro_number as a_ro',
      'ta.title as a_tree',
      'ta.symptom as a_symptom',
      'a.cause_code as a_cause',
      'a.finished_at as a_at',
      'b.id as b_id',
      'b.job_id as b_job_id',
      'jb.ro_number as b_ro',
      'tb.title as b_tree',
      'tb.symptom as b_symptom',
      'b.cause_code as b_cause',
      'b.started_at as b_at',
    )
    // DISTINCT changes nothing (each pair of walks is one row) but keeps MariaDB from merging the pairs into the outer query.
    .distinct();
  // The cause texts are TEXT: sorting rows that carry them needs an on-disk temporary table, so they are read after the pairs are found.
  return knex
    .from(q.as('p'))
    .join('walks as ca', 'ca.id', 'p.a_id')
    .join('walks as cb', 'cb.id', 'p.b_id')
    .select('p.*', 'ca.cause_text as a_cause_text', 'cb.cause_text as b_cause_text')
    .orderBy([{ column: 'p.b_at', order: 'desc' }, { column: 'p.b_id', order: 'desc' }, { column: 'p.a_id', order: 'desc' }]);
};

/** Walks ended as referred or not fixed, per tree, among all finished walks of that tree. */
export const unresolvedQuery = (knex: Knex, s: PatternScope) =>
  scopedWalks(knex, s)
    .join('trees as t', 't.id', 'w.tree_id')
    .groupBy('w.tree_id', 't.title')
    .select(
      'w.tree_id',
      't.title',
      knex.raw('COUNT(*) AS finished'),
      knex.raw("SUM(w.outcome = 'referred') AS referred"),
      knex.raw("SUM(w.outcome = 'not_fixed') AS not_fixed"),
    )
    .orderByRaw("SUM(w.outcome IN ('referred', 'not_fixed')) DESC, COUNT(*) DESC, t.title");

/**
 * Time and steps to a cause per tree: median and 90th percentile over the
 * walks that ended at a cause step. PERCENTILE_CONT interpolates between the
 * two nearest values (MariaDB 10.3+ has it as a window function only, hence
 * the DISTINCT over one row per walk).
 */
export const timesQuery = (knex: Knex, s: PatternScope) => {
  const inner = scopedWalks(knex, s)
    .whereNotNull('w.cause_code')
    .whereNotNull('w.time_spent_s')
    .select(
      'w.tree_id',
      knex.raw('COUNT(*) OVER (PARTITION BY w.tree_id) AS walks'),
      knex.raw('PERCENTILE_CONT(0.5) WITHIN GROUP (ORDER BY w.time_spent_s) OVER (PARTITION BY w.tree_id) AS median_time'),
      knex.raw('PERCENTILE_CONT(0.9) WITHIN GROUP (ORDER BY w.time_spent_s) OVER (PARTITION BY w.tree_id) AS p90_time'),
      knex.raw('PERCENTILE_CONT(0.5) WITHIN GROUP (ORDER BY w.step_count) OVER (PARTITION BY w.tree_id) AS median_steps'),
      knex.raw('PERCENTILE_CONT(0.9) WITHIN GROUP (ORDER BY w.step_count) OVER (PARTITION BY w.tree_id) AS p90_steps'),
    );
  return knex
    .from(inner.as('p'))
    .join('trees as t', 't.id', 'p.tree_id')
    .distinct('p.tree_id', 't.title', 'p.walks', 'p.median_time', 'p.p90_time', 'p.median_steps', 'p.p90_steps')
    .orderBy([{ column: 'p.median_time', order: 'desc' }, { column: 't.title' }]);
};

/** Weekly counts; weeks start on the Monday given (UTC midnight), numbered from 0. */
export const weeksQuery = (knex: Knex, s: PatternScope, firstMonday: Date) =>
  scopedWalks(knex, s)
    .select(
      knex.raw('FLOOR((UNIX_TIMESTAMP(w.finished_at) - ?) / ?) AS week_no', [firstMonday.getTime() / 1000, WEEK_S]),
      knex.raw('COUNT(*) AS finished'),
      knex.raw('SUM(w.cause_code IS NOT NULL) AS with_cause'),
      knex.raw("SUM(w.outcome = 'fixed') AS fixed"),
      knex.raw("SUM(w.outcome = 'not_fixed') AS not_fixed"),
      knex.raw("SUM(w.outcome = 'referred') AS referred"),
    )
    .groupBy('week_no')
    .orderBy('week_no');

/** What a drill-down narrows the scoped walks to. */
export interface DrillSpec {
  measure: DrillMeasure;
  code?: string;
  outcome?: 'referred' | 'not_fixed';
  /** Week start and end instants, for measure 'week'. */
  weekStart?: Date;
  weekEnd?: Date;
}

function narrow(q: Knex.QueryBuilder, d: DrillSpec) {
  if (d.measure === 'cause') q.where('w.cause_code', d.code!);
  if (d.measure === 'timed') q.whereNotNull('w.cause_code').whereNotNull('w.time_spent_s');
  if (d.measure === 'unresolved') {
    if (d.outcome) q.where('w.outcome', d.outcome);
    else q.whereIn('w.outcome', ['referred', 'not_fixed']);
  }
  if (d.measure === 'week') q.where('w.finished_at', '>=', d.weekStart!).where('w.finished_at', '<', d.weekEnd!);
  return q;
}

/** The walks behind a number, newest first, with their job, tree and technician. */
export const drillQuery = (knex: Knex, s: PatternScope, d: DrillSpec) =>
  narrow(scopedWalks(knex, s), d)
    .join('jobs as j', 'j.id', 'w.job_id')
    .join('trees as t', 't.id', 'w.tree_id')
    .leftJoin('users as u', 'u.id', 'w.started_by')
    .select(
      'w.id',
      'w.job_id',
      'j.ro_number',
      'j.vin',
      'j.vehicle_year',
      'j.make',
      'j.model',
      'j.engine',
      'w.tree_id',
      't.title as tree_title',
      'w.outcome',
      'w.cause_code',
      'w.cause_text',
      'u.name as tech_name',
      'w.started_at',
      'w.finished_at',
      'w.step_count',
      'w.time_spent_s',
    )
    .orderBy([{ column: 'w.finished_at', order: 'desc' }, { column: 'w.id', order: 'desc' }]);

/** How many walks a drill-down has in all. */
export const drillCountQuery = (knex: Knex, s: PatternScope, d: DrillSpec) => narrow(scopedWalks(knex, s), d).first(knex.raw('COUNT(*) AS n'));
