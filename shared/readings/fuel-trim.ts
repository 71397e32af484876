/**
 * Fuel trims: totals, verdicts and the pattern across engine speeds and
 * banks. A positive trim means the engine computer is adding fuel (it sees
 * lean); negative means it is removing fuel (it sees rich).
 *
 * Thresholds are common practice, no published source: total trim within
 * ±10 % is normal; the engine computer usually sets a lean or rich code near
 * ±25 % (regulations set emissions criteria, not a percentage). Boundaries:
 * exactly ±10 % is still normal; exactly ±25 % counts as likely to set a code.
 */
import { ReadingError, formatNumber, requireFinite } from './errors';

/** Lowest representable trim, % (SAE J1979 byte 0). */
export const TRIM_PCT_MIN = -100;
/** Highest representable trim, % (SAE J1979 byte 255: 127·100/128). */
export const TRIM_PCT_MAX = (127 * 100) / 128;
/** Totals add a short and a long term trim. */
export const TOTAL_TRIM_PCT_MIN = 2 * TRIM_PCT_MIN;
export const TOTAL_TRIM_PCT_MAX = 2 * TRIM_PCT_MAX;
/** Total trim within ± this is normal (common practice, no published source). */
export const NORMAL_TRIM_LIMIT_PCT = 10;
/** Total trim at or beyond ± this is likely to set a lean or rich code (common practice, no published source). */
export const CODE_TRIM_LIMIT_PCT = 25;

export type FuelTrimVerdict = 'normal' | 'lean' | 'rich' | 'code_lean' | 'code_rich';

/** Throws unless a single trim lies in the representable range −100 to +99.22 %. */
export function requireTrimPct(value: number, field: string, label = 'A fuel trim'): number {
  requireFinite(value, field, label);
  if (value < TRIM_PCT_MIN || value > TRIM_PCT_MAX) {
    throw new ReadingError(field, `${label} of ${formatNumber(value)} % cannot be reported by an engine computer: use −100 to +99.22 %.`);
  }
  return value;
}

/** Short + long term trim, %; each must be representable. */
export function totalTrimPct(shortPct: number, longPct: number, field = 'trim'): number {
  requireTrimPct(shortPct, `${field}.shortPct`, 'A short term trim');
  requireTrimPct(longPct, `${field}.longPct`, 'A long term trim');
  return shortPct + longPct;
}

/** Verdict for a total trim (short + long), %. */
export function fuelTrimVerdict(totalPct: number, field = 'trim'): FuelTrimVerdict {
  requireFinite(totalPct, field, 'The total fuel trim');
  if (totalPct < TOTAL_TRIM_PCT_MIN || totalPct > TOTAL_TRIM_PCT_MAX) {
    throw new ReadingError(field, `A total fuel trim of ${formatNumber(totalPct)} % is impossible: short and long term trims each run −100 to +99.22 %, so the total is −200 to +198.44 %.`);
  }
  if (totalPct >= CODE_TRIM_LIMIT_PCT) return 'code_lean';
  if (totalPct > NORMAL_TRIM_LIMIT_PCT) return 'lean';
  if (totalPct <= -CODE_TRIM_LIMIT_PCT) return 'code_rich';
  if (totalPct < -NORMAL_TRIM_LIMIT_PCT) return 'rich';
  return 'normal';
}

export const isLean = (v: FuelTrimVerdict) => v === 'lean' || v === 'code_lean';
export const isRich = (v: FuelTrimVerdict) => v === 'rich' || v === 'code_rich';

export interface TrimPairPct {
  shortPct: number;
  longPct: number;
}
export interface BankTrimsPct {
  idle?: TrimPairPct;
  at2500?: TrimPairPct;
}
export interface TrimPointJudgement extends TrimPairPct {
  totalPct: number;
  verdict: FuelTrimVerdict;
}

/**
 * What one bank's trims across speeds point to:
 * - unmetered_air: lean at idle, and at 2 500 rpm no longer lean or at most half the idle total (a leak is a
 *   bigger share of the small idle airflow);
 * - lean_all_speeds: lean at idle and still more than half as lean at 2 500 rpm;
 * - lean_at_2500: normal or rich at idle, lean at 2 500 rpm;
 * - lean_speed_unknown: lean at the one speed read;
 * - rich: rich at any speed read (and lean at none);
 * - not_enough_readings: neither speed read.
 */
export type TrimPattern = 'normal' | 'unmetered_air' | 'lean_all_speeds' | 'lean_at_2500' | 'lean_speed_unknown' | 'rich' | 'not_enough_readings';

/** The pattern of one bank's idle and 2 500 rpm totals. */
export function bankTrimPattern(idle?: TrimPointJudgement, at2500?: TrimPointJudgement): TrimPattern {
  if (!idle && !at2500) return 'not_enough_readings';
  const leanIdle = !!idle && isLean(idle.verdict);
  const leanHigh = !!at2500 && isLean(at2500.verdict);
  if (leanIdle && at2500) return !leanHigh || at2500.totalPct <= idle!.totalPct / 2 ? 'unmetered_air' : 'lean_all_speeds';
  if (leanIdle) return 'lean_speed_unknown';
  if (leanHigh) return idle ? 'lean_at_2500' : 'lean_speed_unknown';
  if ((idle && isRich(idle.verdict)) || (at2500 && isRich(at2500.verdict))) return 'rich';
  return 'normal';
}

/** Which way a pattern leans, for comparing banks. */
export function patternDirection(p: TrimPattern): 'lean' | 'rich' | 'none' {
  if (p === 'rich') return 'rich';
  if (p === 'normal' || p === 'not_enough_readings') return 'none';
  return 'lean';
}

/**
 * How far the fault reaches: one bank, both banks, banks that disagree (one lean, one rich),
 * one bank reported only, or none.
 */
export type TrimScope = 'none' | 'one_bank' | 'both_banks' | 'banks_disagree' | 'single_bank_reported';

/** Scope across the banks' patterns. */
export function trimScope(patterns: readonly TrimPattern[]): TrimScope {
  const dirs = patterns.map(patternDirection);
  if (dirs.length < 2) return dirs[0] && dirs[0] !== 'none' ? 'single_bank_reported' : 'none';
  const off = dirs.filter((d) => d !== 'none');
  if (off.length === 0) return 'none';
  if (off.length === 1) return 'one_bank';
  return off[0] === off[1] ? 'both_banks' : 'banks_disagree';
}

/** Judges one speed's short and long term trims; `field` prefixes error fields. */
export function judgeTrimPoint(pair: TrimPairPct, field: string): TrimPointJudgement {
  const totalPct = totalTrimPct(pair.shortPct, pair.longPct, field);
  return { shortPct: pair.shortPct, longPct: pair.longPct, totalPct, verdict: fuelTrimVerdict(totalPct, field) };
}

const SEVERITY: Record<FuelTrimVerdict, number> = { normal: 0, rich: 1, lean: 2, code_rich: 3, code_lean: 4 };

/** The most serious of several verdicts (codes first, lean before rich at equal weight). */
export function worstTrimVerdict(verdicts: readonly FuelTrimVerdict[]): FuelTrimVerdict {
  return verdicts.reduce<FuelTrimVerdict>((w, v) => (SEVERITY[v] > SEVERITY[w] ? v : w), 'normal');
}
