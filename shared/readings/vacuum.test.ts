import { describe, expect, it } from 'vitest';
import { pressureToKpa } from './units';
import { baroKpaFromAltitudeM } from './atmosphere';
import {
  BARO_KPA_MAX,
  expectedIdleVacuumKpa,
  idleVacuumKpaFrom,
  idleVacuumKpaFromMap,
  idleVacuumVerdict,
  mapKpaFromVacuumKpa,
  requireBaroKpa,
  resolveBaroKpa,
  vacuumKpaFromMapKpa,
} from './vacuum';
import { likelyVacuumCauses } from './vacuum-causes';
import { judgeIdleVacuum } from './vacuum-judgement';

const SEA = 101.325;
const kpa = (inHg: number) => pressureToKpa(inHg, 'inHg');
const verdictAt = (inHg: number, profile: 'stock' | 'mild_cam' | 'long_duration_cam' = 'stock', baro = SEA) =>
  idleVacuumVerdict(kpa(inHg), expectedIdleVacuumKpa(profile, baro));

describe('vacuum, MAP and barometric pressure', () => {
  it('vacuum = baro − MAP and back', () => {
    expect(vacuumKpaFromMapKpa(40, 100)).toBe(60);
    expect(vacuumKpaFromMapKpa(110, 100)).toBe(-10); // boost reads as negative vacuum
    expect(mapKpaFromVacuumKpa(60, 100)).toBe(40);
  });
  it('refuses a negative MAP and a vacuum deeper than the air pressure', () => {
    expect(() => vacuumKpaFromMapKpa(-1, 100)).toThrow(expect.objectContaining({ field: 'map', message: expect.stringMatching(/cannot be below 0/) }));
    expect(() => mapKpaFromVacuumKpa(101, 100)).toThrow(expect.objectContaining({ field: 'vacuum', message: expect.stringMatching(/at most 100 kPa/) }));
  });
  it('refuses barometric pressures no car meets', () => {
    expect(requireBaroKpa(BARO_KPA_MAX)).toBe(110);
    expect(() => requireBaroKpa(110.1)).toThrowError(/22\.63 to 110 kPa/);
    expect(() => requireBaroKpa(10)).toThrow(expect.objectContaining({ field: 'baro' }));
  });
  it('prefers a measured barometric pressure, then altitude, then standard sea level', () => {
    expect(resolveBaroKpa({ baroKpa: 90, altitudeM: 3000 })).toEqual({ baroKpa: 90, source: 'measured' });
    expect(resolveBaroKpa({ altitudeM: 1000 })).toEqual({ baroKpa: baroKpaFromAltitudeM(1000), source: 'altitude' });
    expect(resolveBaroKpa({})).toEqual({ baroKpa: SEA, source: 'assumed_sea_level' });
  });
  it('reads gauge vacuum and MAP, refusing what no idling engine shows', () => {
    expect(idleVacuumKpaFrom(0, 'inHg', SEA)).toBe(0);
    expect(() => idleVacuumKpaFrom(-2, 'inHg', SEA)).toThrowError(/cannot be below 0.*0 to 29\.9 inHg/);
    expect(() => idleVacuumKpaFrom(35, 'inHg', SEA)).toThrowError(/more than the air pressure here \(29\.9 inHg\)/);
    expect(idleVacuumKpaFromMap(40, 'kPa', SEA)).toBeCloseTo(61.325, 9);
    expect(() => idleVacuumKpaFromMap(105, 'kPa', SEA)).toThrow(expect.objectContaining({ field: 'map', message: expect.stringMatching(/above the air pressure/) }));
    expect(() => idleVacuumKpaFromMap(-3, 'kPa', SEA)).toThrowError(/cannot be below 0/);
  });
});

describe('idle vacuum verdict boundaries at sea level', () => {
  it('stock: 17 and 21 inHg are within range; just outside is low or high', () => {
    expect(verdictAt(17)).toBe('within_range');
    expect(verdictAt(21)).toBe('within_range');
    expect(verdictAt(16.99)).toBe('low');
    expect(verdictAt(21.01)).toBe('high');
  });
  it('very low below 5 inHg at sea level; exactly 5 is low', () => {
    expect(verdictAt(5)).toBe('low');
    expect(verdictAt(4.99)).toBe('very_low');
    expect(verdictAt(0)).toBe('very_low');
  });
  it('mild cam 14–18 and long-duration cam 10–15 inHg', () => {
    expect(verdictAt(14, 'mild_cam')).toBe('within_range');
    expect(verdictAt(13.9, 'mild_cam')).toBe('low');
    expect(verdictAt(18.1, 'mild_cam')).toBe('high');
    expect(verdictAt(10, 'long_duration_cam')).toBe('within_range');
    expect(verdictAt(15.1, 'long_duration_cam')).toBe('high');
  });
  it('high up, the band low end clamps at 0 and the very-low threshold never exceeds it', () => {
    const band = expectedIdleVacuumKpa('long_duration_cam', baroKpaFromAltitudeM(5000));
    expect(band.lowKpa).toBe(0);
    expect(band.veryLowBelowKpa).toBe(0);
    expect(band.highKpa).toBeGreaterThan(0);
    expect(idleVacuumVerdict(0, band)).toBe('within_range');
  });
  it('the very-low threshold scales with the air pressure', () => {
    const band = expectedIdleVacuumKpa('stock', SEA / 2 + 10);
    expect(band.veryLowBelowKpa).toBeCloseTo(kpa(5) * ((SEA / 2 + 10) / SEA), 9);
  });
  it('refuses an unknown profile', () => {
    expect(() => expectedIdleVacuumKpa('turbo' as never, SEA)).toThrow(expect.objectContaining({ field: 'profile' }));
  });
});

describe('likely causes, every branch', () => {
  it('steady and within range: no causes (a healthy idle)', () => {
    expect(likelyVacuumCauses('within_range', 'steady', 'stock')).toEqual([]);
    expect(likelyVacuumCauses('within_range', undefined, 'stock')).toEqual([]);
  });
  it('needle causes come before level causes', () => {
    const causes = likelyVacuumCauses('low', 'dropping_regularly', 'stock').map((c) => c.cause);
    expect(causes[0]).toMatch(/one cylinder/i);
    expect(causes[1]).toMatch(/gasket/i);
  });
  it('every needle behaviour and level gives causes with reasons and checks', () => {
    for (const needle of ['floating', 'dropping_regularly', 'dropping_now_and_then', 'sinking_at_2500', 'fluttering'] as const) {
      const causes = likelyVacuumCauses('within_range', needle, 'stock');
      expect(causes.length).toBeGreaterThan(0);
      for (const c of causes) {
        expect(c.reason.length).toBeGreaterThan(10);
        expect(c.checks.length).toBeGreaterThan(0);
      }
    }
    expect(likelyVacuumCauses('very_low', 'steady', 'stock')[0].cause).toMatch(/large manifold leak/i);
    expect(likelyVacuumCauses('high', 'steady', 'stock')[0].cause).toMatch(/profile or altitude/i);
  });
  it('a long-duration cam puts camshaft overlap first for a floating or fluttering needle only', () => {
    expect(likelyVacuumCauses('within_range', 'floating', 'long_duration_cam')[0].cause).toBe('Camshaft overlap');
    expect(likelyVacuumCauses('within_range', 'fluttering', 'long_duration_cam')[0].cause).toBe('Camshaft overlap');
    expect(likelyVacuumCauses('within_range', 'floating', 'mild_cam')[0].cause).not.toBe('Camshaft overlap');
    expect(likelyVacuumCauses('within_range', 'sinking_at_2500', 'long_duration_cam')[0].cause).not.toBe('Camshaft overlap');
  });
});

describe('judgeIdleVacuum', () => {
  it('answers in the technician unit with kPa figures, causes, checks and cautions', () => {
    const j = judgeIdleVacuum({ reading: 'vacuum', value: 50, unit: 'kPa', profile: 'stock', needle: 'steady' }, { altitudeM: 0 });
    expect(j.verdict).toBe('low');
    expect(j.expected).toMatchObject({ low: 57.6, high: 71.1, unit: 'kPa' });
    expect(j.measured).toEqual({ value: 50, unit: 'kPa' });
    expect(j.kpa.map).toBeCloseTo(51.325, 9);
    expect(j.baroSource).toBe('altitude');
    expect(j.nextChecks.length).toBeGreaterThan(0);
    expect(j.cautions.map((c) => c.kind)).toEqual(['running_engine', 'smoke_test']);
    expect(j.summary).toMatch(/^Low: 50 kPa of vacuum against 57\.6 kPa to 71\.1 kPa expected for a stock camshaft/);
  });
  it('judges a MAP reading the same as the equal vacuum', () => {
    const fromMap = judgeIdleVacuum({ reading: 'map', value: 40.4, unit: 'kPa' }, {});
    expect(fromMap.verdict).toBe('within_range');
    expect(fromMap.baroSource).toBe('assumed_sea_level');
    expect(fromMap.summary).toMatch(/healthy idle/);
  });
  it('refuses unknown profiles and needle behaviours', () => {
    expect(() => judgeIdleVacuum({ reading: 'vacuum', value: 18, unit: 'inHg', profile: 'x' as never }, {})).toThrow(expect.objectContaining({ field: 'profile' }));
    expect(() => judgeIdleVacuum({ reading: 'vacuum', value: 18, unit: 'inHg', needle: 'x' as never }, {})).toThrow(expect.objectContaining({ field: 'needle' }));
  });
});
