/**
 * Pressure and length conversions. Factors are from NIST Special Publication
 * 811 (2008), Appendix B.8; the foot is exact by definition.
 */
import { PRESSURE_UNITS, type PressureUnit } from './reading-kinds';
import { ReadingError, requireFinite } from './errors';

/** Pascals in one of each pressure unit (NIST SP 811, 2008, Appendix B.8; kPa, Pa and bar are SI multiples). */
export const PA_PER_PRESSURE_UNIT: Readonly<Record<PressureUnit, number>> = {
  Pa: 1,
  kPa: 1000,
  bar: 100_000,
  inHg: 3386.389, // inch of mercury, conventional
  mmHg: 133.3224, // millimetre of mercury, conventional
  psi: 6894.757, // pound-force per square inch
  inH2O: 249.0889, // inch of water, conventional
};

/** Decimals worth showing for a reading in each unit (a gauge is read to about 0.5 inHg). */
export const PRESSURE_UNIT_DECIMALS: Readonly<Record<PressureUnit, number>> = {
  Pa: 0,
  kPa: 1,
  bar: 3,
  inHg: 1,
  mmHg: 0,
  psi: 2,
  inH2O: 0,
};

export const LENGTH_UNITS = ['m', 'ft'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** Metres in one international foot (exact). */
export const M_PER_FT = 0.3048;

/** True when the text names a pressure unit this module knows. */
export function isPressureUnit(unit: string): unit is PressureUnit {
  return (PRESSURE_UNITS as readonly string[]).includes(unit);
}

/** Reads a pressure unit name, or throws naming the field and listing the allowed units. */
export function pressureUnitFrom(unit: string | undefined, field: string, fallback: PressureUnit): PressureUnit {
  if (unit === undefined || unit === '') return fallback;
  if (isPressureUnit(unit)) return unit;
  throw new ReadingError(field, `"${unit}" is not a pressure unit Baywalk knows; use one of ${PRESSURE_UNITS.join(', ')}.`);
}

/** Converts a pressure (absolute or a difference such as vacuum) in `unit` to pascals. */
export function pressureToPa(value: number, unit: PressureUnit, field = 'pressure'): number {
  requireFinite(value, field, 'The pressure');
  const pa = value * PA_PER_PRESSURE_UNIT[unit];
  if (!Number.isFinite(pa)) throw new ReadingError(field, `${value} ${unit} is too large to be a pressure.`);
  return pa;
}

/** Converts pascals to `unit`. */
export function pressureFromPa(valuePa: number, unit: PressureUnit, field = 'pressure'): number {
  requireFinite(valuePa, field, 'The pressure');
  return valuePa / PA_PER_PRESSURE_UNIT[unit];
}

/** Converts a pressure between two units. */
export function convertPressure(value: number, from: PressureUnit, to: PressureUnit, field = 'pressure'): number {
  if (from === to) return requireFinite(value, field, 'The pressure');
  return pressureFromPa(pressureToPa(value, from, field), to, field);
}

/** kPa from any pressure unit (the unit the calculator works in). */
export function pressureToKpa(value: number, unit: PressureUnit, field = 'pressure'): number {
  return pressureToPa(value, unit, field) / 1000;
}

/** Any pressure unit from kPa. */
export function pressureFromKpa(valueKpa: number, unit: PressureUnit, field = 'pressure'): number {
  return pressureFromPa(valueKpa * 1000, unit, field);
}

/** Rounds a pressure to the decimals worth showing in its unit. */
export function roundPressure(value: number, unit: PressureUnit): number {
  const f = 10 ** PRESSURE_UNIT_DECIMALS[unit];
  return Math.round(value * f) / f;
}

/** Metres from feet (exact factor). */
export function ftToM(valueFt: number, field = 'altitude'): number {
  return requireFinite(valueFt, field, 'The length') * M_PER_FT;
}

/** Feet from metres. */
export function mToFt(valueM: number, field = 'altitude'): number {
  return requireFinite(valueM, field, 'The length') / M_PER_FT;
}

/** Metres from a length in m or ft. */
export function lengthToM(value: number, unit: LengthUnit, field = 'altitude'): number {
  return unit === 'm' ? requireFinite(value, field, 'The length') : ftToM(value, field);
}

/** A length in m or ft from metres. */
export function lengthFromM(valueM: number, unit: LengthUnit, field = 'altitude'): number {
  return unit === 'm' ? requireFinite(valueM, field, 'The length') : mToFt(valueM, field);
}
