/**
 * Manifold vacuum: conversions between vacuum, manifold absolute pressure
 * (MAP) and barometric pressure, the expected idle vacuum band for an engine
 * profile at an altitude or a measured barometric pressure, and the verdict.
 *
 * Altitude model. Vacuum is a difference: vacuum = baro − MAP. An idling
 * engine needs about the same absolute manifold pressure wherever it is (the
 * pressure that fills the cylinders enough to make idle torque), so each
 * profile's band is fixed as a MAP band derived from its sea-level vacuum band
 * (MAP = 101.325 kPa − vacuum), and the expected vacuum at the shop is the
 * local barometric pressure minus that MAP band. The vacuum therefore falls
 * by exactly the drop in barometric pressure: about 1.07 inHg per 1 000 ft
 * near sea level, 0.93 on average up to 10 000 ft; the shop rule "1 inHg per
 * 1 000 ft" (U.S. Army subcourse OD1001) is an approximation of this. Where
 * the local air cannot reach the profile's MAP band the low end is clamped to
 * 0 (the engine is near the limit of idling at all).
 */
import type { EngineProfile, PressureUnit } from './reading-kinds';
import { ReadingError, formatNumber, requireFinite } from './errors';
import { pressureFromKpa, pressureToKpa, roundPressure } from './units';
import { BARO_KPA_AT_MAX_ALTITUDE, P0_PA, baroKpaFromAltitudeM } from './atmosphere';

const P0_KPA = P0_PA / 1000;
/** Tolerance for comparisons of values converted through floating point, kPa. */
const EPS_KPA = 1e-9;

/** Highest measured barometric pressure accepted, kPa: above the standard value at −500 m, leaving room for weather. */
export const BARO_KPA_MAX = 110;
/** Lowest measured barometric pressure accepted, kPa: the standard value at the top of the troposphere. */
export const BARO_KPA_MIN = BARO_KPA_AT_MAX_ALTITUDE;

export interface SeaLevelVacuumBand {
  lowInHg: number;
  highInHg: number;
  /** Where the band comes from (shown in the tests and the README). */
  provenance: string;
}

/** Steady idle vacuum at sea level per engine profile, inHg. */
export const SEA_LEVEL_IDLE_VACUUM_INHG: Readonly<Record<EngineProfile, SeaLevelVacuumBand>> = {
  // Published: OD1001 lesson 3 gives about 20 inHg for a healthy engine; the 17–21 band is common practice.
  stock: { lowInHg: 17, highInHg: 21, provenance: 'published (OD1001: about 20 inHg); band common practice' },
  // Common practice, from memory: no published source. A mild cam costs a few inHg of idle vacuum;
  // the band sits between stock and long-duration and overlaps both.
  mild_cam: { lowInHg: 14, highInHg: 18, provenance: 'common practice, from memory (no published source)' },
  // Common practice, from memory: long-duration, high-overlap cams idle lower and less steadily.
  long_duration_cam: { lowInHg: 10, highInHg: 15, provenance: 'common practice, from memory' },
};

/** Below this at sea level a steady reading means a large manifold leak (common practice, no published source). */
export const VERY_LOW_VACUUM_INHG_AT_SEA_LEVEL = 5;

export const PROFILE_LABELS: Readonly<Record<EngineProfile, string>> = {
  stock: 'Stock camshaft',
  mild_cam: 'Mild performance camshaft',
  long_duration_cam: 'Long-duration camshaft',
};

/** Throws unless the barometric pressure is one the air can have. */
export function requireBaroKpa(baroKpa: number, field = 'baro'): number {
  requireFinite(baroKpa, field, 'The barometric pressure');
  if (baroKpa < BARO_KPA_MIN || baroKpa > BARO_KPA_MAX) {
    throw new ReadingError(field, `A barometric pressure of ${formatNumber(baroKpa)} kPa is not possible where a car can run: use ${formatNumber(BARO_KPA_MIN)} to ${BARO_KPA_MAX} kPa (about ${formatNumber(pressureFromKpa(BARO_KPA_MIN, 'inHg'), 1)} to ${formatNumber(pressureFromKpa(BARO_KPA_MAX, 'inHg'), 1)} inHg).`);
  }
  return baroKpa;
}

/** Throws unless the value is an absolute pressure (not negative). */
export function requireAbsoluteKpa(valueKpa: number, field: string, label: string): number {
  requireFinite(valueKpa, field, label);
  if (valueKpa < 0) {
    throw new ReadingError(field, `${label} is an absolute pressure and cannot be below 0 (a perfect vacuum); ${formatNumber(valueKpa)} kPa is impossible.`);
  }
  return valueKpa;
}

/** Vacuum (baro − MAP) in kPa; negative means boost above the air pressure. */
export function vacuumKpaFromMapKpa(mapKpa: number, baroKpa: number): number {
  requireAbsoluteKpa(mapKpa, 'map', 'Manifold absolute pressure');
  requireBaroKpa(baroKpa);
  return baroKpa - mapKpa;
}

/** Manifold absolute pressure in kPa from a vacuum in kPa; refuses a vacuum deeper than the air pressure. */
export function mapKpaFromVacuumKpa(vacuumKpa: number, baroKpa: number): number {
  requireFinite(vacuumKpa, 'vacuum', 'The vacuum');
  requireBaroKpa(baroKpa);
  const map = baroKpa - vacuumKpa;
  if (map < -EPS_KPA) {
    throw new ReadingError('vacuum', `A vacuum of ${formatNumber(vacuumKpa)} kPa is deeper than the air pressure here (${formatNumber(baroKpa)} kPa): the manifold would be below a perfect vacuum. Use at most ${formatNumber(baroKpa)} kPa.`);
  }
  return Math.max(0, map);
}

/** Vacuum in inHg from MAP and barometric pressure in kPa. */
export function vacuumInHgFromMapKpa(mapKpa: number, baroKpa: number): number {
  return pressureFromKpa(vacuumKpaFromMapKpa(mapKpa, baroKpa), 'inHg');
}

/** MAP in kPa from a vacuum in inHg and barometric pressure in kPa. */
export function mapKpaFromVacuumInHg(vacuumInHg: number, baroKpa: number): number {
  return mapKpaFromVacuumKpa(pressureToKpa(vacuumInHg, 'inHg', 'vacuum'), baroKpa);
}

/** Where the barometric pressure came from. */
export type BaroSource = 'measured' | 'altitude' | 'assumed_sea_level';

/** Picks the barometric pressure: a measured one wins over altitude; neither means standard sea level. */
export function resolveBaroKpa(ctx: { altitudeM?: number; baroKpa?: number }): { baroKpa: number; source: BaroSource } {
  if (ctx.baroKpa !== undefined) return { baroKpa: requireBaroKpa(ctx.baroKpa), source: 'measured' };
  if (ctx.altitudeM !== undefined) return { baroKpa: baroKpaFromAltitudeM(ctx.altitudeM), source: 'altitude' };
  return { baroKpa: P0_KPA, source: 'assumed_sea_level' };
}

/** Expected idle vacuum for a profile at a barometric pressure, kPa. */
export interface ExpectedIdleVacuumKpa {
  lowKpa: number;
  highKpa: number;
  /** Readings below this are very low (a large leak). */
  veryLowBelowKpa: number;
  /** The profile's idle MAP band, the same at any altitude. */
  mapLowKpa: number;
  mapHighKpa: number;
}

/** Expected idle vacuum band for an engine profile at a measured or standard barometric pressure (see the altitude model above). */
export function expectedIdleVacuumKpa(profile: EngineProfile, baroKpa: number): ExpectedIdleVacuumKpa {
  requireBaroKpa(baroKpa);
  const band = SEA_LEVEL_IDLE_VACUUM_INHG[profile];
  if (!band) throw new ReadingError('profile', `"${String(profile)}" is not an engine profile; use stock, mild_cam or long_duration_cam.`);
  const mapLowKpa = P0_KPA - pressureToKpa(band.highInHg, 'inHg');
  const mapHighKpa = P0_KPA - pressureToKpa(band.lowInHg, 'inHg');
  const lowKpa = Math.max(0, baroKpa - mapHighKpa);
  const highKpa = Math.max(0, baroKpa - mapLowKpa);
  // A large leak leaves a share of the air pressure as vacuum: scale the sea-level
  // threshold with the air pressure, and never let it rise above the band's low end.
  const veryLowBelowKpa = Math.min(lowKpa, pressureToKpa(VERY_LOW_VACUUM_INHG_AT_SEA_LEVEL, 'inHg') * (baroKpa / P0_KPA));
  return { lowKpa, highKpa, veryLowBelowKpa, mapLowKpa, mapHighKpa };
}

/** Expected idle vacuum band for a profile at an altitude in metres (standard atmosphere). */
export function expectedIdleVacuumKpaAtAltitudeM(profile: EngineProfile, altitudeM: number): ExpectedIdleVacuumKpa {
  return expectedIdleVacuumKpa(profile, baroKpaFromAltitudeM(altitudeM));
}

export type VacuumVerdict = 'within_range' | 'low' | 'very_low' | 'high';

/** Verdict for a measured idle vacuum against the band; the band's ends count as within range. */
export function idleVacuumVerdict(vacuumKpa: number, expected: ExpectedIdleVacuumKpa): VacuumVerdict {
  requireFinite(vacuumKpa, 'vacuum', 'The vacuum');
  if (vacuumKpa > expected.highKpa + EPS_KPA) return 'high';
  if (vacuumKpa >= expected.lowKpa - EPS_KPA) return 'within_range';
  if (vacuumKpa < expected.veryLowBelowKpa - EPS_KPA) return 'very_low';
  return 'low';
}

/** Reads a measured idle vacuum in any unit into kPa, refusing what no idling engine can show. */
export function idleVacuumKpaFrom(value: number, unit: PressureUnit, baroKpa: number, field = 'vacuum'): number {
  const kpa = pressureToKpa(value, unit, field);
  const baroInUnit = roundPressure(pressureFromKpa(baroKpa, unit), unit);
  if (kpa < 0) {
    throw new ReadingError(field, `Idle vacuum cannot be below 0: an idling engine's manifold is below the air pressure around it. Enter the gauge reading as a positive number, 0 to ${formatNumber(baroInUnit)} ${unit} here.`);
  }
  if (kpa > baroKpa + EPS_KPA) {
    throw new ReadingError(field, `${formatNumber(value)} ${unit} of vacuum is more than the air pressure here (${formatNumber(baroInUnit)} ${unit}); no manifold can go below a perfect vacuum. Use 0 to ${formatNumber(baroInUnit)} ${unit}.`);
  }
  return kpa;
}

/** Reads a measured MAP in any unit into a vacuum in kPa. */
export function idleVacuumKpaFromMap(value: number, unit: PressureUnit, baroKpa: number, field = 'map'): number {
  const mapKpa = requireAbsoluteKpa(pressureToKpa(value, unit, field), field, 'Manifold absolute pressure');
  if (mapKpa > baroKpa + EPS_KPA) {
    const baroInUnit = roundPressure(pressureFromKpa(baroKpa, unit), unit);
    throw new ReadingError(field, `A MAP of ${formatNumber(value)} ${unit} is above the air pressure here (${formatNumber(baroInUnit)} ${unit}); an idling engine without boost cannot do that. Use 0 to ${formatNumber(baroInUnit)} ${unit}, or check the barometric pressure or altitude.`);
  }
  return baroKpa - mapKpa;
}
