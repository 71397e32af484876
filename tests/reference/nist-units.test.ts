import { describe, expect, it } from 'vitest';
import Qty from 'js-quantities';
import { M_PER_FT, PA_PER_PRESSURE_UNIT, convertPressure, ftToM, mToFt, pressureToPa } from '@/shared/readings';

// Source: NIST Special Publication 811 (2008 edition), Appendix B.8, factors for units listed alphabetically.
describe('pressure factors: NIST SP 811 (2008), Appendix B.8', () => {
  const nist: Array<[keyof typeof PA_PER_PRESSURE_UNIT, number, string]> = [
    ['inHg', 3386.389, 'inch of mercury, conventional'],
    ['mmHg', 133.3224, 'millimetre of mercury, conventional'],
    ['psi', 6894.757, 'pound-force per square inch'],
    ['inH2O', 249.0889, 'inch of water, conventional'],
  ];
  for (const [unit, pa, name] of nist) {
    it(`1 ${unit} (${name}) = ${pa} Pa (NIST SP 811 B.8)`, () => {
      expect(PA_PER_PRESSURE_UNIT[unit]).toBe(pa);
      expect(pressureToPa(1, unit)).toBe(pa);
    });
  }
  it('kPa and bar are SI multiples: 1 kPa = 1 000 Pa, 1 bar = 100 000 Pa (NIST SP 811)', () => {
    expect(pressureToPa(1, 'kPa')).toBe(1000);
    expect(pressureToPa(1, 'bar')).toBe(100_000);
  });
  it('1 ft = 0.3048 m exactly (NIST SP 811 B.8)', () => {
    expect(M_PER_FT).toBe(0.3048);
    expect(ftToM(10_000)).toBeCloseTo(3048, 10);
    expect(mToFt(0.3048)).toBeCloseTo(1, 12);
  });
});

// Cross-check against an independent library from the registry (js-quantities 1.8.0, dev dependency).
// Tolerances: js-quantities' inHg (3386.388 Pa) is within 3e-7 of NIST; its mmHg within 3e-7; its psi
// (6894.76 Pa) within 1e-6; its inH2O is the 39.2 °F value, within 3e-5 of NIST's conventional inch.
describe('cross-check with js-quantities (independent library)', () => {
  const cases: Array<[keyof typeof PA_PER_PRESSURE_UNIT, string, number]> = [
    ['inHg', 'inHg', 3e-7],
    ['mmHg', 'mmHg', 3e-7],
    ['psi', 'psi', 1e-6],
    ['inH2O', 'inH2O', 3e-5],
    ['bar', 'bar', 1e-12],
    ['kPa', 'kPa', 1e-12],
  ];
  for (const [ours, theirs, rel] of cases) {
    it(`${ours} → Pa agrees within ${rel} relative`, () => {
      for (const v of [0.5, 1, 17, 29.921, 101.325]) {
        const expected = Qty(v, theirs).to('Pa').scalar;
        expect(Math.abs(pressureToPa(v, ours) - expected) / expected).toBeLessThanOrEqual(rel);
      }
    });
  }
  it('inHg ↔ kPa ↔ psi chains agree within 1e-6 relative', () => {
    const expected = Qty(20, 'inHg').to('psi').scalar;
    expect(Math.abs(convertPressure(20, 'inHg', 'psi') - expected) / expected).toBeLessThanOrEqual(1e-6);
  });
  it('feet → metres agrees exactly (to 1e-12)', () => {
    for (const ft of [1, 1000, 5280, 10_000]) expect(ftToM(ft)).toBeCloseTo(Qty(ft, 'ft').to('m').scalar, 9);
  });
});
