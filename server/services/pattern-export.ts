import type { ExportTable } from '@/shared/schemas/patterns';
import { WALK_OUTCOME_LABELS, type WalkOutcome } from '@/shared/schemas/walks';
import { INSTALL_TYPE_LABELS, SYMPTOM_LABELS, type InstallType, type Symptom } from '@/trees/tree-format';
import type { CsvColumn } from '../http/csv';
import type { ComebackPairRow, DrillWalkRow, RepeatCountRow, TimeStatsRow, UnresolvedCountRow, WeekCountRow, CauseCountRow } from '../repositories/pattern-repository';

const DAY_MS = 86_400_000;
const WEEK_MS = 7 * DAY_MS;
const num = (v: unknown) => (v === null || v === undefined ? null : Number(v));
const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
const day = (d: Date) => new Date(d).toISOString().slice(0, 10);
const vehicle = (r: { vehicle_year: number | null; make: string | null; model: string | null }) => [r.vehicle_year, r.make, r.model].filter((p) => p !== null && p !== '').join(' ');
const installLabel = (t: string) => INSTALL_TYPE_LABELS[t as InstallType] ?? t;
const symptomLabel = (s: string) => SYMPTOM_LABELS[s as Symptom] ?? s;
const outcomeLabel = (o: string | null) => (o ? (WALK_OUTCOME_LABELS[o as WalkOutcome] ?? o) : '');

interface Ctx {
  title: (code: string | null) => string | null;
  firstMonday: Date;
}

/** The CSV columns of each exported table, reading the repository's rows as they stream. */
export function exportColumns(table: ExportTable, ctx: Ctx): CsvColumn<any>[] {
  const t = ctx.title;
  switch (table) {
    case 'causes':
      return cols<CauseCountRow>([
        ['cause_code', (r) => r.cause_code],
        ['cause', (r) => t(r.cause_code)],
        ['walks', (r) => num(r.walks)],
      ]);
    case 'repeats':
      return cols<RepeatCountRow>([
        ['install_type', (r) => installLabel(r.install_type)],
        ['cause_code', (r) => r.cause_code],
        ['cause', (r) => t(r.cause_code)],
        ['jobs', (r) => num(r.jobs)],
        ['walks', (r) => num(r.walks)],
        ['last_found_at', (r) => iso(r.last_found_at)],
      ]);
    case 'comebacks':
      return cols<ComebackPairRow>([
        ['vin', (r) => r.vin],
        ['vehicle', (r) => vehicle(r)],
        ['fixed_walk_id', (r) => r.a_id],
        ['fixed_ro', (r) => r.a_ro],
        ['fixed_tree', (r) => r.a_tree],
        ['fixed_symptom', (r) => symptomLabel(r.a_symptom)],
        ['fixed_cause', (r) => t(r.a_cause) ?? r.a_cause_text],
        ['fixed_at', (r) => iso(r.a_at)],
        ['again_walk_id', (r) => r.b_id],
        ['again_ro', (r) => r.b_ro],
        ['again_tree', (r) => r.b_tree],
        ['again_symptom', (r) => symptomLabel(r.b_symptom)],
        ['again_cause', (r) => t(r.b_cause) ?? r.b_cause_text],
        ['again_at', (r) => iso(r.b_at)],
        ['days_between', (r) => Math.floor((new Date(r.b_at).getTime() - new Date(r.a_at).getTime()) / DAY_MS)],
        ['same_symptom', (r) => r.a_symptom === r.b_symptom],
        ['same_cause', (r) => r.a_cause !== null && r.a_cause === r.b_cause],
      ]);
    case 'unresolved':
      return cols<UnresolvedCountRow>([
        ['tree', (r) => r.title],
        ['finished', (r) => num(r.finished)],
        ['referred', (r) => num(r.referred)],
        ['not_fixed', (r) => num(r.not_fixed)],
      ]);
    case 'times':
      return cols<TimeStatsRow>([
        ['tree', (r) => r.title],
        ['walks_to_a_cause', (r) => num(r.walks)],
        ['median_minutes', (r) => minutes(r.median_time)],
        ['p90_minutes', (r) => minutes(r.p90_time)],
        ['median_steps', (r) => num(r.median_steps)],
        ['p90_steps', (r) => num(r.p90_steps)],
      ]);
    case 'weeks':
      return cols<WeekCountRow>([
        ['week_starting', (r) => day(new Date(ctx.firstMonday.getTime() + Number(r.week_no) * WEEK_MS))],
        ['finished', (r) => num(r.finished)],
        ['with_cause', (r) => num(r.with_cause)],
        ['fixed', (r) => num(r.fixed)],
        ['not_fixed', (r) => num(r.not_fixed)],
        ['referred', (r) => num(r.referred)],
      ]);
    case 'walks':
      return cols<DrillWalkRow>([
        ['walk_id', (r) => r.id],
        ['ro', (r) => r.ro_number],
        ['vin', (r) => r.vin],
        ['vehicle', (r) => vehicle(r)],
        ['engine', (r) => r.engine],
        ['tree', (r) => r.tree_title],
        ['technician', (r) => r.tech_name],
        ['outcome', (r) => outcomeLabel(r.outcome)],
        ['cause_code', (r) => r.cause_code],
        ['cause', (r) => r.cause_text],
        ['steps', (r) => r.step_count],
        ['minutes', (r) => minutes(r.time_spent_s)],
        ['started_at', (r) => iso(r.started_at)],
        ['finished_at', (r) => iso(r.finished_at)],
      ]);
  }
}

function minutes(seconds: unknown): number | null {
  const s = num(seconds);
  return s === null ? null : Math.round((s / 60) * 10) / 10;
}

function cols<R>(list: Array<[string, (r: R) => unknown]>): CsvColumn<R>[] {
  return list.map(([header, value]) => ({ header, value }));
}
