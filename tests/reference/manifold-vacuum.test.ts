import { describe, expect, it } from 'vitest';
import {
  SEA_LEVEL_IDLE_VACUUM_INHG,
  baroKpaFromAltitudeM,
  expectedIdleVacuumKpa,
  expectedIdleVacuumKpaAtAltitudeM,
  ftToM,
  judgeIdleVacuum,
  mapKpaFromVacuumInHg,
  pressureFromKpa,
  vacuumInHgFromMapKpa,
} from '@/shared/readings';

const inHg = (kpa: number) => pressureFromKpa(kpa, 'inHg');
const SEA_LEVEL_KPA = 101.325; // US Standard Atmosphere 1976

describe('vacuum = baro − MAP (SAE J1979 MAP with US Standard Atmosphere 1976 sea level, NIST SP 811 inHg)', () => {
  const cases: Array<[number, number]> = [
    [18, 40.4],
    [20, 33.6],
    [21, 30.2],
  ];
  for (const [vac, map] of cases) {
    it(`${vac} inHg of vacuum at sea level is a MAP of ${map} kPa (to 0.05 kPa)`, () => {
      expect(Math.abs(mapKpaFromVacuumInHg(vac, SEA_LEVEL_KPA) - map)).toBeLessThanOrEqual(0.05);
      expect(Math.abs(vacuumInHgFromMapKpa(map, SEA_LEVEL_KPA) - vac)).toBeLessThanOrEqual(0.02);
    });
  }
});

describe('idle vacuum at sea level', () => {
  it('a healthy stock engine idles at about 20 inHg (published: U.S. Army subcourse OD1001, lesson 3)', () => {
    const j = judgeIdleVacuum({ reading: 'vacuum', value: 20, unit: 'inHg', profile: 'stock', needle: 'steady' }, { altitudeM: 0 });
    expect(j.verdict).toBe('within_range');
  });

  it('the stock band is 17–21 inHg (common practice, no published source)', () => {
    expect(SEA_LEVEL_IDLE_VACUUM_INHG.stock).toMatchObject({ lowInHg: 17, highInHg: 21 });
    const band = expectedIdleVacuumKpa('stock', SEA_LEVEL_KPA);
    expect(inHg(band.lowKpa)).toBeCloseTo(17, 9);
    expect(inHg(band.highKpa)).toBeCloseTo(21, 9);
  });

  it('a long-duration camshaft idles at 10–15 inHg (common practice, from memory; not the only check of this feature)', () => {
    const band = expectedIdleVacuumKpa('long_duration_cam', SEA_LEVEL_KPA);
    expect(inHg(band.lowKpa)).toBeCloseTo(10, 9);
    expect(inHg(band.highKpa)).toBeCloseTo(15, 9);
  });

  it('steady far below normal, under about 5 inHg, is very low: a large manifold leak (common practice, no published source)', () => {
    const j = judgeIdleVacuum({ reading: 'vacuum', value: 4, unit: 'inHg', needle: 'steady' }, { altitudeM: 0 });
    expect(j.verdict).toBe('very_low');
    expect(j.causes[0].cause).toMatch(/large manifold leak/i);
  });
});

describe('vacuum falls with altitude', () => {
  it('about 1 inHg per 1 000 ft (published: OD1001; an approximation, so checked to ±15 % up to 10 000 ft)', () => {
    for (const ft of [1000, 3000, 5000, 10_000]) {
      const drop = inHg(expectedIdleVacuumKpa('stock', SEA_LEVEL_KPA).lowKpa - expectedIdleVacuumKpaAtAltitudeM('stock', ftToM(ft)).lowKpa);
      expect(Math.abs(drop - ft / 1000) / (ft / 1000)).toBeLessThanOrEqual(0.15);
    }
  });

  it('the model gives 1.07 inHg per 1 000 ft near sea level and about 0.93 on average to 10 000 ft (US Standard Atmosphere 1976)', () => {
    const near = inHg(baroKpaFromAltitudeM(0) - baroKpaFromAltitudeM(ftToM(1000)));
    expect(near).toBeCloseTo(1.07, 2);
    const average = inHg(baroKpaFromAltitudeM(0) - baroKpaFromAltitudeM(ftToM(10_000))) / 10;
    expect(average).toBeCloseTo(0.93, 2);
  });

  it('the vacuum falls by exactly the drop in barometric pressure: the idle MAP band is the same anywhere (model, from REFERENCES §6)', () => {
    const sea = expectedIdleVacuumKpa('mild_cam', SEA_LEVEL_KPA);
    const high = expectedIdleVacuumKpaAtAltitudeM('mild_cam', 1500);
    expect(high.mapLowKpa).toBeCloseTo(sea.mapLowKpa, 12);
    expect(sea.highKpa - high.highKpa).toBeCloseTo(SEA_LEVEL_KPA - baroKpaFromAltitudeM(1500), 9);
  });
});

// Reading the needle: published in OD1001 unless marked.
describe('reading the needle (OD1001)', () => {
  const judge = (value: number, needle: Parameters<typeof judgeIdleVacuum>[0]['needle']) =>
    judgeIdleVacuum({ reading: 'vacuum', value, unit: 'inHg', profile: 'stock', needle }, { altitudeM: 0 });

  it('steady but low: late ignition or valve timing, intake or throttle-body gasket leak, even ring wear (OD1001)', () => {
    const causes = judge(15, 'steady').causes.map((c) => c.cause).join(' | ');
    expect(causes).toMatch(/gasket/);
    expect(causes).toMatch(/valve timing/);
    expect(causes).toMatch(/ignition timing/);
    expect(causes).toMatch(/ring wear/);
  });
  it('floating slowly around 12–16 inHg: mixture wrong (OD1001)', () => {
    expect(judge(14, 'floating').causes[0].cause).toMatch(/mixture/i);
  });
  it('dropping regularly by 3–6 inHg: one cylinder losing: misfire, leaking valve, head gasket (OD1001)', () => {
    expect(judge(18, 'dropping_regularly').causes[0].cause).toMatch(/misfire.*valve.*head gasket/i);
  });
  it('dropping now and then: sticking valve or intermittent ignition fault (OD1001)', () => {
    const causes = judge(18, 'dropping_now_and_then').causes.map((c) => c.cause);
    expect(causes[0]).toMatch(/sticking valve/i);
    expect(causes[1]).toMatch(/intermittent ignition/i);
  });
  it('sinking slowly at about 2 500 rpm: restricted exhaust (OD1001)', () => {
    expect(judge(18, 'sinking_at_2500').causes[0].cause).toMatch(/restricted exhaust/i);
  });
  it('fast flutter between about 14 and 19 inHg: worn valve guides (common practice, no published source)', () => {
    expect(judge(17, 'fluttering').causes[0].cause).toMatch(/valve guides/i);
  });
  it('snapping the throttle shut overshoots to about 25 inHg (OD1001): such a reading is high and says so', () => {
    const j = judge(25, 'steady');
    expect(j.verdict).toBe('high');
    expect(j.causes.map((c) => c.reason).join(' ')).toMatch(/25 inHg/);
  });
});
