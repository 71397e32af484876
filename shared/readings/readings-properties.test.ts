import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ENGINE_PROFILES, NEEDLE_BEHAVIOURS, PRESSURE_UNITS } from './reading-kinds';
import { convertPressure, lengthFromM, lengthToM } from './units';
import { MAX_ALTITUDE_M, MIN_ALTITUDE_M, altitudeMFromBaroKpa, baroKpaFromAltitudeM } from './atmosphere';
import { expectedIdleVacuumKpaAtAltitudeM, mapKpaFromVacuumKpa, vacuumKpaFromMapKpa } from './vacuum';
import { TRIM_PCT_MAX, TRIM_PCT_MIN, fuelTrimVerdict } from './fuel-trim';
import { decodeFuelTrimPct } from './obd';
import { judgeReading } from './judge-reading';
import { assessReadings } from './readings-check';

const unit = fc.constantFrom(...PRESSURE_UNITS);
const profile = fc.constantFrom(...ENGINE_PROFILES);
const altitudeM = fc.double({ min: MIN_ALTITUDE_M, max: MAX_ALTITUDE_M, noNaN: true });
const relClose = (a: number, b: number, rel: number) => Math.abs(a - b) <= rel * Math.max(1, Math.abs(b));

describe('properties (fast-check)', () => {
  it('pressure conversions round-trip between any two units (relative error under 1e-12)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), unit, unit, (v, a, b) => relClose(convertPressure(convertPressure(v, a, b), b, a), v, 1e-12)),
    );
  });

  it('length conversions round-trip (relative error under 1e-12)', () => {
    fc.assert(fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (m) => relClose(lengthToM(lengthFromM(m, 'ft'), 'ft'), m, 1e-12)));
  });

  it('altitude → pressure → altitude round-trips within 1 mm', () => {
    fc.assert(fc.property(altitudeM, (h) => Math.abs(altitudeMFromBaroKpa(baroKpaFromAltitudeM(h)) - h) < 1e-3));
  });

  it('pressure falls strictly with altitude', () => {
    fc.assert(
      fc.property(altitudeM, altitudeM, (a, b) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const [lo, hi] = a < b ? [a, b] : [b, a];
        return baroKpaFromAltitudeM(hi) < baroKpaFromAltitudeM(lo);
      }),
    );
  });

  it('the expected vacuum range falls with altitude: the high end strictly, the low end never rises (it clamps at 0)', () => {
    fc.assert(
      fc.property(profile, altitudeM, altitudeM, (p, a, b) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const [lo, hi] = a < b ? [a, b] : [b, a];
        const low = expectedIdleVacuumKpaAtAltitudeM(p, lo);
        const high = expectedIdleVacuumKpaAtAltitudeM(p, hi);
        return high.highKpa < low.highKpa && high.lowKpa <= low.lowKpa && (low.lowKpa === 0 || high.lowKpa < low.lowKpa);
      }),
    );
  });

  it('vacuum ↔ MAP round-trips for every possible vacuum', () => {
    fc.assert(
      fc.property(fc.double({ min: 22.7, max: 110, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (baro, share) => {
        const vacuum = baro * share;
        return Math.abs(vacuumKpaFromMapKpa(mapKpaFromVacuumKpa(vacuum, baro), baro) - vacuum) < 1e-9;
      }),
    );
  });

  it('every trim byte 0..255 decodes within −100..+99.22 %, and in order', () => {
    for (let a = 0; a <= 255; a++) {
      const pct = decodeFuelTrimPct(a);
      expect(pct).toBeGreaterThanOrEqual(TRIM_PCT_MIN);
      expect(pct).toBeLessThanOrEqual(TRIM_PCT_MAX);
      if (a > 0) expect(pct).toBeGreaterThan(decodeFuelTrimPct(a - 1));
    }
  });

  it('no NaN for valid input: idle vacuum judgements', () => {
    fc.assert(
      fc.property(profile, altitudeM, fc.double({ min: 0, max: 1, noNaN: true }), fc.option(fc.constantFrom(...NEEDLE_BEHAVIOURS), { nil: undefined }), unit, (p, h, share, needle, u) => {
        const baro = baroKpaFromAltitudeM(h);
        const value = convertPressure(baro * share, 'kPa', u);
        const j = judgeReading({ kind: 'idle_vacuum' }, { value, unit: u, profile: p, needle }, { altitudeM: h });
        return [j.expected!.low, j.expected!.high].every(Number.isFinite) && j.summary.length > 0 && !j.summary.includes('NaN');
      }),
    );
  });

  it('no NaN for valid input: trims and the whole check', () => {
    const trim = fc.double({ min: TRIM_PCT_MIN, max: TRIM_PCT_MAX, noNaN: true });
    const pair = fc.record({ shortPct: trim, longPct: trim });
    fc.assert(
      fc.property(pair, pair, pair, profile, altitudeM, fc.double({ min: 0, max: 1, noNaN: true }), (i1, h1, i2, p, h, share) => {
        expect(['normal', 'lean', 'rich', 'code_lean', 'code_rich']).toContain(fuelTrimVerdict(i1.shortPct + i1.longPct));
        const { result, errors } = assessReadings({
          map: { value: baroKpaFromAltitudeM(h) * share, unit: 'kPa' },
          altitude: { value: h, unit: 'm' },
          profile: p,
          trims: { bank1: { idle: i1, at2500: h1 }, bank2: { idle: i2 } },
        });
        expect(errors).toEqual({});
        const json = JSON.stringify(result);
        return !json.includes('null') && !json.includes('NaN') && result!.trims!.banks.every((b) => Number.isFinite(b.idle!.totalPct));
      }),
    );
  });
});
