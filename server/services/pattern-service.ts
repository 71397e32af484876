import type { Readable } from 'node:stream';
import type { Knex } from 'knex';
import {
  COMEBACK_LIMIT,
  DEFAULT_RANGE_DAYS,
  DRILL_LIMIT,
  MAX_RANGE_DAYS,
  type AppliedFilters,
  type ComebackRow,
  type ExportTable,
  type PatternDrillAnswer,
  type PatternDrillQuery,
  type PatternFilters,
  type PatternOptions,
  type PatternReport,
  type WeekRow,
} from '@/shared/schemas/patterns';
import type { InstallType, Symptom } from '@/trees/tree-format';
import { createPatternRepository, type ComebackPairRow, type DrillWalkRow, type PatternScope } from '../repositories/pattern-repository';
import { badRequest } from '../errors';
import type { CsvColumn } from '../http/csv';
import { exportColumns } from './pattern-export';

const DAY_MS = 86_400_000;
const WEEK_MS = 7 * DAY_MS;

/** YYYY-MM-DD of an instant, in UTC. */
export const isoDay = (d: Date) => d.toISOString().slice(0, 10);
const dayStart = (day: string) => new Date(`${day}T00:00:00Z`);
/** The Monday (UTC midnight) on or before an instant. */
export const mondayOf = (d: Date) => {
  const midnight = dayStart(isoDay(d));
  return new Date(midnight.getTime() - ((midnight.getUTCDay() + 6) % 7) * DAY_MS);
};
const num = (v: unknown) => (v === null || v === undefined ? 0 : Number(v));
const round1 = (v: unknown) => Math.round(num(v) * 10) / 10;

/** Words for a cause code no published tree names any more ("port-left-open" → "Port left open"). */
export const codeWords = (code: string) => code.charAt(0).toUpperCase() + code.slice(1).replace(/-/g, ' ');

/** The filters with the date range made explicit, and the scope the queries take. */
export function resolveFilters(shopId: number, f: PatternFilters, today = new Date()): { applied: AppliedFilters; scope: PatternScope; firstMonday: Date } {
  const to = f.to ?? (f.from ? isoDay(new Date(Math.min(today.getTime(), dayStart(f.from).getTime() + (DEFAULT_RANGE_DAYS - 1) * DAY_MS))) : isoDay(today));
  const from = f.from ?? isoDay(new Date(dayStart(to).getTime() - (DEFAULT_RANGE_DAYS - 1) * DAY_MS));
  const span = (dayStart(to).getTime() - dayStart(from).getTime()) / DAY_MS;
  if (span < 0) throw badRequest('The end date is before the start date.', { fields: { to: 'Pick an end date on or after the start date.' } });
  if (span >= MAX_RANGE_DAYS) throw badRequest(`Pick a range shorter than ${MAX_RANGE_DAYS} days.`, { fields: { from: `Pick a range shorter than ${MAX_RANGE_DAYS} days.` } });
  const start = dayStart(from);
  const scope: PatternScope = {
    shopId,
    start,
    end: new Date(dayStart(to).getTime() + DAY_MS),
    installType: f.installType as InstallType | undefined,
    treeId: f.treeId,
    make: f.make,
    engine: f.engine,
    techId: f.techId,
  };
  const applied: AppliedFilters = {
    from,
    to,
    installType: (f.installType as InstallType | undefined) ?? null,
    treeId: f.treeId ?? null,
    make: f.make ?? null,
    engine: f.engine ?? null,
    techId: f.techId ?? null,
  };
  return { applied, scope, firstMonday: mondayOf(start) };
}

const vehicleOf = (r: { vehicle_year: number | null; make: string | null; model: string | null }) =>
  [r.vehicle_year, r.make, r.model].filter((p) => p !== null && p !== '').join(' ');

/** One comeback pair as the API returns it. */
export function toComeback(r: ComebackPairRow, title: (code: string | null) => string | null): ComebackRow {
  const a = new Date(r.a_at);
  const b = new Date(r.b_at);
  return {
    vin: r.vin,
    vehicle: vehicleOf(r),
    first: { walkId: r.a_id, jobId: r.a_job_id, roNumber: r.a_ro, treeTitle: r.a_tree, symptom: r.a_symptom as Symptom, causeCode: r.a_cause, causeTitle: title(r.a_cause) ?? r.a_cause_text, at: a.toISOString() },
    again: { walkId: r.b_id, jobId: r.b_job_id, roNumber: r.b_ro, treeTitle: r.b_tree, symptom: r.b_symptom as Symptom, causeCode: r.b_cause, causeTitle: title(r.b_cause) ?? r.b_cause_text, at: b.toISOString() },
    days: Math.floor((b.getTime() - a.getTime()) / DAY_MS),
    sameSymptom: r.a_symptom === r.b_symptom,
    sameCause: r.a_cause !== null && r.a_cause === r.b_cause,
  };
}

/** A drill-down walk as the API returns it. */
export function toPatternWalk(r: DrillWalkRow) {
  return {
    id: r.id,
    jobId: r.job_id,
    roNumber: r.ro_number,
    vin: r.vin,
    vehicle: [vehicleOf(r), r.engine].filter(Boolean).join(', '),
    treeId: r.tree_id,
    treeTitle: r.tree_title,
    outcome: r.outcome,
    causeCode: r.cause_code,
    causeText: r.cause_text,
    techName: r.tech_name,
    startedAt: new Date(r.started_at).toISOString(),
    finishedAt: r.finished_at ? new Date(r.finished_at).toISOString() : null,
    steps: r.step_count,
    timeSpentS: r.time_spent_s,
  };
}

/** Patterns: repeat causes, comebacks, unresolved walks, time to a cause and weekly trends for one shop. */
export function createPatternService(knex: Knex) {
  const repo = createPatternRepository(knex);

  async function titler(shopId: number) {
    const titles = await repo.causeTitles(shopId);
    return (code: string | null) => (code ? (titles.get(code) ?? codeWords(code)) : null);
  }

  return {
    /** Every measure for the filters, computed by the database. */
    async report(shopId: number, filters: PatternFilters, today = new Date()): Promise<PatternReport> {
      const { applied, scope, firstMonday } = resolveFilters(shopId, filters, today);
      const windowDays = await repo.windowDays(shopId);
      const [title, totals, causes, repeats, pairs, unresolved, times, weeks] = await Promise.all([
        titler(shopId),
        repo.totals(scope),
        repo.causes(scope),
        repo.repeats(scope),
        repo.comebacks(scope, windowDays),
        repo.unresolved(scope),
        repo.times(scope),
        repo.weeks(scope, firstMonday),
      ]);
      const finished = num(totals?.finished);
      const comebacks = pairs.map((p) => toComeback(p, title));
      const cameBack = new Set(pairs.map((p) => p.a_id));
      return {
        filters: applied,
        windowDays,
        totals: {
          finished,
          withCause: num(totals?.with_cause),
          fixed: num(totals?.fixed),
          notFixed: num(totals?.not_fixed),
          referred: num(totals?.referred),
          cameBack: cameBack.size,
          comebacks: comebacks.length,
        },
        causes: causes.map((r) => ({ code: r.cause_code, title: title(r.cause_code)!, walks: num(r.walks), share: finished ? num(r.walks) / finished : 0 })),
        repeats: repeats.map((r) => ({
          installType: r.install_type as InstallType,
          code: r.cause_code,
          title: title(r.cause_code)!,
          jobs: num(r.jobs),
          walks: num(r.walks),
          lastFoundAt: new Date(r.last_found_at).toISOString(),
        })),
        comebacks: comebacks.slice(0, COMEBACK_LIMIT),
        unresolved: unresolved.map((r) => {
          const n = num(r.finished);
          const bad = num(r.referred) + num(r.not_fixed);
          return { treeId: r.tree_id, treeTitle: r.title, finished: n, referred: num(r.referred), notFixed: num(r.not_fixed), share: n ? bad / n : 0 };
        }),
        times: times.map((r) => ({
          treeId: r.tree_id,
          treeTitle: r.title,
          walks: num(r.walks),
          medianTimeS: round1(r.median_time),
          p90TimeS: round1(r.p90_time),
          medianSteps: round1(r.median_steps),
          p90Steps: round1(r.p90_steps),
        })),
        weeks: fillWeeks(firstMonday, scope.end, weeks, pairs),
      };
    },

    /** The choices for the filter pickers. */
    async options(shopId: number): Promise<PatternOptions> {
      const [opts, windowDays] = await Promise.all([repo.options(shopId), repo.windowDays(shopId)]);
      return { ...opts, windowDays };
    },

    /** The walks behind one number of the report (newest first, at most DRILL_LIMIT). */
    async drill(shopId: number, q: PatternDrillQuery, today = new Date()): Promise<PatternDrillAnswer> {
      const { scope } = resolveFilters(shopId, q, today);
      const weekStart = q.week ? mondayOf(dayStart(q.week)) : undefined;
      const { rows, total } = await repo.drill(
        scope,
        { measure: q.measure, code: q.code, outcome: q.outcome, weekStart, weekEnd: weekStart && new Date(weekStart.getTime() + WEEK_MS) },
        DRILL_LIMIT,
      );
      return { items: rows.map(toPatternWalk), total, limit: DRILL_LIMIT };
    },

    /** A table of the report as a row stream with its CSV columns and a file name; the route sends it. */
    async exportTable(shopId: number, table: ExportTable, filters: PatternFilters, today = new Date()): Promise<{ filename: string; rows: Readable; columns: CsvColumn<any>[] }> {
      const { applied, scope, firstMonday } = resolveFilters(shopId, filters, today);
      const [windowDays, title] = await Promise.all([repo.windowDays(shopId), titler(shopId)]);
      const rows = repo.stream(table, scope, { windowDays, firstMonday });
      return { filename: `baywalk-${table}-${applied.from}-to-${applied.to}.csv`, rows, columns: exportColumns(table, { title, firstMonday }) };
    },
  };
}

/** Every week of the range, with zeros for weeks without walks; fixed walks that came back counted in the week they closed. */
function fillWeeks(firstMonday: Date, end: Date, rows: Array<{ week_no: unknown; finished: unknown; with_cause: unknown; fixed: unknown; not_fixed: unknown; referred: unknown }>, pairs: ComebackPairRow[]): WeekRow[] {
  const count = Math.ceil((end.getTime() - firstMonday.getTime()) / WEEK_MS);
  const byNo = new Map(rows.map((r) => [num(r.week_no), r]));
  const back = new Map<number, Set<number>>();
  for (const p of pairs) {
    const n = Math.floor((new Date(p.a_at).getTime() - firstMonday.getTime()) / WEEK_MS);
    back.set(n, (back.get(n) ?? new Set()).add(p.a_id));
  }
  return Array.from({ length: count }, (_, n) => {
    const r = byNo.get(n);
    return {
      week: isoDay(new Date(firstMonday.getTime() + n * WEEK_MS)),
      finished: num(r?.finished),
      withCause: num(r?.with_cause),
      fixed: num(r?.fixed),
      notFixed: num(r?.not_fixed),
      referred: num(r?.referred),
      cameBack: back.get(n)?.size ?? 0,
    };
  });
}

export type PatternService = ReturnType<typeof createPatternService>;
