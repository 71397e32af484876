import { describe, expect, it } from 'vitest';
import {
  LAPSE_RATE_K_PER_M,
  P0_PA,
  PRESSURE_EXPONENT,
  T0_K,
  altitudeMFromBaroKpa,
  baroKpaFromAltitudeM,
  ftToM,
  pressureFromKpa,
} from '@/shared/readings';

// Source for every value here: U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), identical to the
// ICAO / ISO 2533 standard atmosphere below 11 km. Published tables are rounded as printed, and
// geometric vs geopotential altitude differ by under 0.1 % of pressure below 3 km, so each check
// allows a relative tolerance of 2e-4 (about ±1 in the last printed digit).
const REL_TOL = 2e-4;
const close = (actual: number, expected: number, rel = REL_TOL) => expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(rel);

describe('U.S. Standard Atmosphere 1976: constants', () => {
  it('uses P0 = 101 325 Pa, T0 = 288.15 K, L = 0.0065 K/m, exponent 5.255876 (US Standard Atmosphere 1976)', () => {
    expect(P0_PA).toBe(101_325);
    expect(T0_K).toBe(288.15);
    expect(LAPSE_RATE_K_PER_M).toBe(0.0065);
    expect(PRESSURE_EXPONENT).toBeCloseTo(5.255876, 6);
  });

  it('gives 29.921 inHg and 14.696 psi at sea level (US Standard Atmosphere 1976 with NIST SP 811 factors)', () => {
    expect(pressureFromKpa(baroKpaFromAltitudeM(0), 'inHg')).toBeCloseTo(29.921, 3);
    expect(pressureFromKpa(baroKpaFromAltitudeM(0), 'psi')).toBeCloseTo(14.696, 3);
  });
});

describe('U.S. Standard Atmosphere 1976: pressure table (metres)', () => {
  const table: Array<[number, number]> = [
    [0, 101.325],
    [500, 95.46],
    [1000, 89.88],
    [1500, 84.56],
    [2000, 79.5],
    // The 1976 report's Table I prints 701.08 mb; its values are truncated, so ±1 in the last digit.
    [3000, 70.11],
  ];
  for (const [altitudeM, kpa] of table) {
    it(`${altitudeM} m → ${kpa} kPa (US Standard Atmosphere 1976, tolerance 2e-4 relative)`, () => {
      close(baroKpaFromAltitudeM(altitudeM), kpa);
    });
    it(`${kpa} kPa → ${altitudeM} m, inverse (US Standard Atmosphere 1976, within 2 m)`, () => {
      expect(Math.abs(altitudeMFromBaroKpa(kpa) - altitudeM)).toBeLessThanOrEqual(2);
    });
  }
});

describe('U.S. Standard Atmosphere 1976: pressure table (feet, psia)', () => {
  const table: Array<[number, number]> = [
    [1000, 14.175],
    [5000, 12.23],
    [10_000, 10.108],
  ];
  for (const [ft, psia] of table) {
    it(`${ft} ft → ${psia} psia (US Standard Atmosphere 1976, tolerance 2e-4 relative)`, () => {
      close(pressureFromKpa(baroKpaFromAltitudeM(ftToM(ft)), 'psi'), psia);
    });
  }
});

describe('troposphere limit (US Standard Atmosphere 1976: the formula holds to 11 km)', () => {
  it('answers at 11 000 m and refuses above, naming the field and the allowed span', () => {
    expect(baroKpaFromAltitudeM(11_000)).toBeCloseTo(22.632, 2); // 226.32 hPa at 11 km, US Standard Atmosphere 1976
    expect(() => baroKpaFromAltitudeM(11_001)).toThrowError(/above the troposphere.*-500 to 11000 m/);
  });
});
