/**
 * The full judgement of one idle vacuum (or MAP) reading: verdict, expected
 * band in the technician's unit, ranked causes, next checks and cautions.
 */
import type { EngineProfile, NeedleBehaviour, PressureUnit } from './reading-kinds';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS } from './reading-kinds';
import { ReadingError, formatNumber } from './errors';
import { pressureFromKpa, roundPressure } from './units';
import { cautionsFor, uniqueChecks, type Caution } from './cautions';
import { likelyVacuumCauses } from './vacuum-causes';
import { VERDICT_LABELS } from './verdict-labels';
import {
  PROFILE_LABELS,
  expectedIdleVacuumKpa,
  idleVacuumKpaFrom,
  idleVacuumKpaFromMap,
  idleVacuumVerdict,
  resolveBaroKpa,
  type BaroSource,
  type VacuumVerdict,
} from './vacuum';

export interface IdleVacuumInput {
  /** What was read: gauge vacuum, or MAP from a scan tool. */
  reading: 'vacuum' | 'map';
  value: number;
  unit: PressureUnit;
  profile?: EngineProfile;
  needle?: NeedleBehaviour;
}

export interface IdleVacuumJudgement {
  verdict: VacuumVerdict;
  summary: string;
  profile: EngineProfile;
  needle?: NeedleBehaviour;
  /** The measured vacuum and the expected band, in the unit the technician used, rounded for display. */
  measured: { value: number; unit: PressureUnit };
  expected: { low: number; high: number; veryLowBelow: number; unit: PressureUnit };
  /** The same figures unrounded, kPa. */
  kpa: { vacuum: number; map: number; baro: number; expectedLow: number; expectedHigh: number; veryLowBelow: number };
  baroSource: BaroSource;
  causes: Array<{ cause: string; reason: string }>;
  nextChecks: string[];
  cautions: Caution[];
}

const BARO_WORDS: Record<BaroSource, string> = {
  measured: 'the measured barometric pressure',
  altitude: 'the standard air pressure at that altitude',
  assumed_sea_level: 'sea-level air pressure (no altitude or barometric pressure given)',
};

/** Judges an idle vacuum or MAP reading for an engine profile at an altitude or measured barometric pressure. */
export function judgeIdleVacuum(input: IdleVacuumInput, ctx: { altitudeM?: number; baroKpa?: number }): IdleVacuumJudgement {
  const profile = input.profile ?? 'stock';
  if (!ENGINE_PROFILES.includes(profile)) throw new ReadingError('profile', `"${String(profile)}" is not an engine profile; use ${ENGINE_PROFILES.join(', ')}.`);
  if (input.needle !== undefined && !NEEDLE_BEHAVIOURS.includes(input.needle)) {
    throw new ReadingError('needle', `"${String(input.needle)}" is not a needle behaviour; use ${NEEDLE_BEHAVIOURS.join(', ')}.`);
  }
  const { baroKpa, source } = resolveBaroKpa(ctx);
  const unit = input.unit;
  const vacuumKpa =
    input.reading === 'map' ? idleVacuumKpaFromMap(input.value, unit, baroKpa) : idleVacuumKpaFrom(input.value, unit, baroKpa);
  const band = expectedIdleVacuumKpa(profile, baroKpa);
  const verdict = idleVacuumVerdict(vacuumKpa, band);
  const ranked = likelyVacuumCauses(verdict, input.needle, profile);
  const checks = uniqueChecks(ranked.flatMap((c) => c.checks));

  const inUnit = (kpa: number) => roundPressure(pressureFromKpa(kpa, unit), unit);
  const expected = { low: inUnit(band.lowKpa), high: inUnit(band.highKpa), veryLowBelow: inUnit(band.veryLowBelowKpa), unit };
  const measured = { value: inUnit(vacuumKpa), unit };
  const show = (v: number) => `${formatNumber(v, 3)} ${unit}`;
  const summary =
    `${VERDICT_LABELS[verdict]}: ${show(measured.value)} of vacuum against ${show(expected.low)} to ${show(expected.high)} expected ` +
    `for a ${PROFILE_LABELS[profile].toLowerCase()} at ${formatNumber(baroKpa, 1)} kPa, ${BARO_WORDS[source]}.` +
    (verdict === 'within_range' && (!input.needle || input.needle === 'steady') ? ' A steady needle in this band is a healthy idle.' : '');

  return {
    verdict,
    summary,
    profile,
    needle: input.needle,
    measured,
    expected,
    kpa: { vacuum: vacuumKpa, map: baroKpa - vacuumKpa, baro: baroKpa, expectedLow: band.lowKpa, expectedHigh: band.highKpa, veryLowBelow: band.veryLowBelowKpa },
    baroSource: source,
    causes: ranked.map(({ cause, reason }) => ({ cause, reason })),
    nextChecks: checks.map((c) => c.text),
    cautions: cautionsFor(checks),
  };
}
