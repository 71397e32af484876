import { describe, expect, it } from 'vitest';
import { assessReadings, checkReadings } from './readings-check';

describe('assessReadings', () => {
  it('judges vacuum and trims together with the barometric pressure from the altitude', () => {
    const { result, errors } = assessReadings({
      vacuum: { value: 13, unit: 'inHg' },
      altitude: { value: 5000, unit: 'ft' },
      profile: 'stock',
      needle: 'steady',
      trims: { bank1: { idle: { shortPct: 9, longPct: 8 }, at2500: { shortPct: 1, longPct: 2 } } },
    });
    expect(errors).toEqual({});
    expect(result?.baro.source).toBe('altitude');
    expect(result?.baro.altitudeM).toBeCloseTo(1524, 6);
    expect(result?.vacuum?.verdict).toBe('within_range');
    expect(result?.trims?.pattern).toBe('unmetered_air');
  });

  it('a measured barometric pressure wins over the altitude and reports its standard altitude', () => {
    const { result } = assessReadings({ map: { value: 45, unit: 'kPa' }, baro: { value: 25, unit: 'inHg' }, altitude: { value: 0, unit: 'm' } });
    expect(result?.baro.source).toBe('measured');
    expect(result?.baro.altitudeM).toBeGreaterThan(1400);
    expect(result?.vacuum?.kpa.vacuum).toBeCloseTo(84.66 - 45, 1);
  });

  it('a measured barometric pressure beyond the standard span still judges, without an altitude', () => {
    const { result, errors } = assessReadings({ vacuum: { value: 18, unit: 'inHg' }, baro: { value: 108, unit: 'kPa' } });
    expect(errors).toEqual({});
    expect(result?.baro.altitudeM).toBeUndefined();
  });

  it('with neither altitude nor barometric pressure, assumes sea level', () => {
    expect(assessReadings({ vacuum: { value: 18, unit: 'inHg' } }).result?.baro).toEqual({ kPa: 101.325, source: 'assumed_sea_level', altitudeM: 0 });
  });

  it('collects a message for every impossible field at once', () => {
    const { result, errors } = assessReadings({
      vacuum: { value: 18, unit: 'inHg' },
      altitude: { value: 40_000, unit: 'ft' },
      trims: { bank1: { idle: { shortPct: 120, longPct: 0 } }, bank2: { at2500: { shortPct: 0, longPct: -130 } } },
    });
    expect(result).toBeUndefined();
    expect(Object.keys(errors).sort()).toEqual(['altitude', 'trims.bank1.idle.shortPct', 'trims.bank2.at2500.longPct']);
    expect(errors.altitude).toMatch(/40000 ft is outside the standard-atmosphere model.*-1640 to 36089 ft/);
  });

  it('altitude in metres keeps the message in metres', () => {
    expect(assessReadings({ vacuum: { value: 18, unit: 'inHg' }, altitude: { value: 12_000, unit: 'm' } }).errors.altitude).toMatch(/12000 m is above the troposphere/);
  });

  it('a vacuum deeper than the air pressure is refused while trims still judge', () => {
    const { result, errors } = assessReadings({ vacuum: { value: 31, unit: 'inHg' }, trims: { bank1: { idle: { shortPct: 1, longPct: 1 } } } });
    expect(errors.vacuum).toMatch(/more than the air pressure/);
    expect(result?.vacuum).toBeUndefined();
    expect(result?.trims?.verdict).toBe('normal');
  });

  it('checkReadings throws the first error, else returns the result', () => {
    expect(() => checkReadings({ map: { value: -5, unit: 'kPa' } })).toThrow(expect.objectContaining({ field: 'map' }));
    expect(checkReadings({ map: { value: 35, unit: 'kPa' } }).vacuum?.verdict).toBe('within_range');
  });
});
