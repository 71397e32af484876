import { describe, expect, it } from 'vitest';
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M, altitudeMFromBaroKpa, baroKpaFromAltitudeM, requireAltitudeM } from './atmosphere';

describe('atmosphere limits', () => {
  it('accepts the ends of the span and refuses beyond them', () => {
    expect(baroKpaFromAltitudeM(MIN_ALTITUDE_M)).toBeGreaterThan(101.325);
    expect(baroKpaFromAltitudeM(MAX_ALTITUDE_M)).toBeLessThan(23);
    expect(() => requireAltitudeM(11_000.5)).toThrowError(/above the troposphere/);
    expect(() => requireAltitudeM(-500.5)).toThrowError(/below any place a car can be/);
    expect(() => requireAltitudeM(Number.NaN)).toThrowError(/must be a number/);
  });

  it('refuses a barometric pressure with no altitude in the model, saying the allowed span', () => {
    expect(() => altitudeMFromBaroKpa(20)).toThrowError(/22\.63 to 107\.48 kPa/);
    expect(() => altitudeMFromBaroKpa(120)).toThrowError(/no altitude in the model/);
    expect(() => altitudeMFromBaroKpa(Number.NaN)).toThrowError(/must be a number/);
  });

  it('round-trips at the ends of the span', () => {
    expect(altitudeMFromBaroKpa(baroKpaFromAltitudeM(MAX_ALTITUDE_M))).toBeCloseTo(MAX_ALTITUDE_M, 6);
    expect(altitudeMFromBaroKpa(baroKpaFromAltitudeM(MIN_ALTITUDE_M))).toBeCloseTo(MIN_ALTITUDE_M, 6);
  });
});
