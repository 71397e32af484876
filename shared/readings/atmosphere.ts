/**
 * Barometric pressure from altitude and back, by the U.S. Standard Atmosphere
 * 1976 (identical to the ICAO / ISO 2533 atmosphere below 11 km). Only the
 * troposphere layer is modelled: its formula is wrong above 11 km, so
 * altitudes there are refused rather than answered badly.
 */
import { ReadingError, formatNumber, requireFinite } from './errors';

/** Sea-level standard pressure, Pa (US Standard Atmosphere 1976). */
export const P0_PA = 101_325;
/** Sea-level standard temperature, K. */
export const T0_K = 288.15;
/** Troposphere temperature lapse rate, K/m. */
export const LAPSE_RATE_K_PER_M = 0.0065;
/** g0·M/(R·L), the exponent of the troposphere pressure formula. */
export const PRESSURE_EXPONENT = 5.255876;

/** Top of the troposphere layer the formula covers, m (geopotential). */
export const MAX_ALTITUDE_M = 11_000;
/** Lowest altitude accepted, m: below the lowest dry land on Earth with room to spare. */
export const MIN_ALTITUDE_M = -500;

/** Barometric pressure in Pa at a geopotential altitude in metres (troposphere only). */
export function baroPaFromAltitudeM(altitudeM: number, field = 'altitude'): number {
  requireAltitudeM(altitudeM, field);
  return P0_PA * (1 - (LAPSE_RATE_K_PER_M * altitudeM) / T0_K) ** PRESSURE_EXPONENT;
}

/** Barometric pressure in kPa at an altitude in metres. */
export function baroKpaFromAltitudeM(altitudeM: number, field = 'altitude'): number {
  return baroPaFromAltitudeM(altitudeM, field) / 1000;
}

/** Standard pressures at the ends of the accepted altitude span, kPa. */
export const BARO_KPA_AT_MAX_ALTITUDE = baroKpaFromAltitudeM(MAX_ALTITUDE_M);
export const BARO_KPA_AT_MIN_ALTITUDE = baroKpaFromAltitudeM(MIN_ALTITUDE_M);

/** Altitude in metres whose standard pressure is the given pressure in Pa. */
export function altitudeMFromBaroPa(baroPa: number, field = 'baro'): number {
  requireFinite(baroPa, field, 'The barometric pressure');
  const kpa = baroPa / 1000;
  if (kpa < BARO_KPA_AT_MAX_ALTITUDE || kpa > BARO_KPA_AT_MIN_ALTITUDE) {
    throw new ReadingError(
      field,
      `A barometric pressure of ${formatNumber(kpa)} kPa has no altitude in the model: use ${formatNumber(BARO_KPA_AT_MAX_ALTITUDE)} to ${formatNumber(BARO_KPA_AT_MIN_ALTITUDE)} kPa (${MIN_ALTITUDE_M} m to ${MAX_ALTITUDE_M} m).`,
    );
  }
  return (T0_K / LAPSE_RATE_K_PER_M) * (1 - (baroPa / P0_PA) ** (1 / PRESSURE_EXPONENT));
}

/** Altitude in metres whose standard pressure is the given pressure in kPa. */
export function altitudeMFromBaroKpa(baroKpa: number, field = 'baro'): number {
  requireFinite(baroKpa, field, 'The barometric pressure');
  return altitudeMFromBaroPa(baroKpa * 1000, field);
}

/** Throws unless the altitude lies in the modelled span. */
export function requireAltitudeM(altitudeM: number, field = 'altitude'): number {
  requireFinite(altitudeM, field, 'The altitude');
  if (altitudeM > MAX_ALTITUDE_M) {
    throw new ReadingError(field, `An altitude of ${formatNumber(altitudeM, 0)} m is above the troposphere (11 000 m), where the standard-atmosphere formula stops; use ${MIN_ALTITUDE_M} to ${MAX_ALTITUDE_M} m.`);
  }
  if (altitudeM < MIN_ALTITUDE_M) {
    throw new ReadingError(field, `An altitude of ${formatNumber(altitudeM, 0)} m is below any place a car can be; use ${MIN_ALTITUDE_M} to ${MAX_ALTITUDE_M} m.`);
  }
  return altitudeM;
}
