/**
 * The Readings screen's whole check in one call, shared by the server
 * (POST /api/readings/check) and the browser (live verdict while typing):
 * barometric pressure from a measurement or the altitude, idle vacuum from a
 * gauge or MAP, and fuel trims per bank. Every impossible field is collected,
 * so a form can show each message beside its own field.
 */
import type { EngineProfile, NeedleBehaviour, PressureUnit } from './reading-kinds';
import { ReadingError, formatNumber, isReadingError, requireFinite } from './errors';
import { lengthToM, mToFt, pressureToKpa, type LengthUnit } from './units';
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M, altitudeMFromBaroKpa } from './atmosphere';
import { resolveBaroKpa, type BaroSource } from './vacuum';
import { judgeIdleVacuum, type IdleVacuumJudgement } from './vacuum-judgement';
import { judgeFuelTrims, type FuelTrimJudgement } from './fuel-trim-judgement';
import { judgeTrimPoint, type BankTrimsPct } from './fuel-trim';

export interface PressureReading {
  value: number;
  unit: PressureUnit;
}

export interface ReadingsCheckInput {
  vacuum?: PressureReading;
  map?: PressureReading;
  baro?: PressureReading;
  altitude?: { value: number; unit: LengthUnit };
  profile?: EngineProfile;
  needle?: NeedleBehaviour;
  trims?: { bank1?: BankTrimsPct; bank2?: BankTrimsPct };
}

export interface ReadingsCheckResult {
  baro: { kPa: number; source: BaroSource; altitudeM?: number };
  vacuum?: IdleVacuumJudgement;
  trims?: FuelTrimJudgement;
}

/** A partial result plus a message per impossible field (empty when all is well). */
export interface ReadingsAssessment {
  result?: ReadingsCheckResult;
  errors: Record<string, string>;
}

/** Runs every part of the check, collecting each impossible field instead of stopping at the first. */
export function assessReadings(input: ReadingsCheckInput): ReadingsAssessment {
  const errors: Record<string, string> = {};
  const attempt = <T>(fn: () => T): T | undefined => {
    try {
      return fn();
    } catch (err) {
      if (!isReadingError(err)) throw err;
      if (!(err.field in errors)) errors[err.field] = err.message;
      return undefined;
    }
  };

  const baro = attempt(() => resolveBaro(input));
  let vacuum: IdleVacuumJudgement | undefined;
  if (baro && (input.vacuum || input.map)) {
    const reading = input.vacuum ? 'vacuum' : 'map';
    const r = (input.vacuum ?? input.map)!;
    vacuum = attempt(() => judgeIdleVacuum({ reading, value: r.value, unit: r.unit, profile: input.profile, needle: input.needle }, baroCtx(baro)));
  }

  let trims: FuelTrimJudgement | undefined;
  const banks = input.trims;
  if (banks && (banks.bank1 || banks.bank2)) {
    // Judge each point on its own first so every bad trim gets its own message.
    let ok = true;
    for (const bank of ['bank1', 'bank2'] as const) {
      for (const speed of ['idle', 'at2500'] as const) {
        const pair = banks[bank]?.[speed];
        if (pair && attempt(() => judgeTrimPoint(pair, `trims.${bank}.${speed}`)) === undefined) ok = false;
      }
    }
    if (ok) trims = attempt(() => judgeFuelTrims({ bank1: banks.bank1 ?? {}, bank2: banks.bank2 }));
  }

  return { result: baro ? { baro, vacuum, trims } : undefined, errors };
}

/** Runs the whole check and throws the first ReadingError (for callers that want all or nothing). */
export function checkReadings(input: ReadingsCheckInput): ReadingsCheckResult {
  const { result, errors } = assessReadings(input);
  const [field] = Object.keys(errors);
  if (field) throw new ReadingError(field, errors[field]);
  return result!;
}

/** The context that reproduces the resolved pressure, so the judgement names its true source. */
function baroCtx(baro: ReadingsCheckResult['baro']): { altitudeM?: number; baroKpa?: number } {
  if (baro.source === 'measured') return { baroKpa: baro.kPa };
  if (baro.source === 'altitude') return { altitudeM: baro.altitudeM };
  return {};
}

function resolveBaro(input: ReadingsCheckInput): ReadingsCheckResult['baro'] {
  if (input.baro) {
    const kPa = pressureToKpa(input.baro.value, input.baro.unit, 'baro');
    const resolved = resolveBaroKpa({ baroKpa: kPa });
    let altitudeM: number | undefined;
    try {
      altitudeM = altitudeMFromBaroKpa(resolved.baroKpa);
    } catch {
      altitudeM = undefined; // weather can push a real baro past the standard −500 m value; the judgement does not need it
    }
    return { kPa: resolved.baroKpa, source: resolved.source, altitudeM };
  }
  if (input.altitude) {
    const { value, unit } = input.altitude;
    requireFinite(value, 'altitude', 'The altitude');
    const altitudeM = lengthToM(value, unit, 'altitude');
    if (unit === 'ft' && (altitudeM > MAX_ALTITUDE_M || altitudeM < MIN_ALTITUDE_M)) {
      // Say it in the unit the person typed.
      throw new ReadingError('altitude', `An altitude of ${formatNumber(value, 0)} ft is outside the standard-atmosphere model (troposphere): use ${formatNumber(mToFt(MIN_ALTITUDE_M), 0)} to ${formatNumber(mToFt(MAX_ALTITUDE_M), 0)} ft.`);
    }
    const resolved = resolveBaroKpa({ altitudeM });
    return { kPa: resolved.baroKpa, source: resolved.source, altitudeM };
  }
  const resolved = resolveBaroKpa({});
  return { kPa: resolved.baroKpa, source: resolved.source, altitudeM: 0 };
}
