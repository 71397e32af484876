import { describe, expect, it } from 'vitest';
import { ReadingError, formatNumber, isReadingError } from './errors';
import { convertPressure, lengthFromM, lengthToM, pressureFromPa, pressureToPa, pressureUnitFrom, roundPressure } from './units';

describe('units', () => {
  it('converts between any two pressure units through pascals', () => {
    expect(convertPressure(1, 'bar', 'kPa')).toBe(100);
    expect(convertPressure(100, 'kPa', 'kPa')).toBe(100);
    expect(pressureFromPa(3386.389, 'inHg')).toBe(1);
  });

  it('refuses NaN and infinities, naming the field', () => {
    expect(() => pressureToPa(Number.NaN, 'kPa', 'vacuum')).toThrow(ReadingError);
    try {
      pressureToPa(Number.POSITIVE_INFINITY, 'kPa', 'vacuum');
      expect.unreachable();
    } catch (err) {
      expect(isReadingError(err) && err.field).toBe('vacuum');
      expect((err as Error).message).toMatch(/must be a number/);
    }
  });

  it('reads unit names, defaulting when empty and listing the allowed ones when unknown', () => {
    expect(pressureUnitFrom(undefined, 'unit', 'inHg')).toBe('inHg');
    expect(pressureUnitFrom('', 'unit', 'kPa')).toBe('kPa');
    expect(pressureUnitFrom('psi', 'unit', 'kPa')).toBe('psi');
    expect(() => pressureUnitFrom('atm', 'unit', 'kPa')).toThrowError(/"atm" is not a pressure unit.*kPa, Pa, inHg, psi, mmHg, inH2O, bar/);
  });

  it('converts lengths in m and ft', () => {
    expect(lengthToM(1000, 'ft')).toBeCloseTo(304.8, 10);
    expect(lengthToM(12, 'm')).toBe(12);
    expect(lengthFromM(304.8, 'ft')).toBeCloseTo(1000, 10);
    expect(lengthFromM(5, 'm')).toBe(5);
    expect(() => lengthToM(Number.NaN, 'm')).toThrow(/must be a number/);
  });

  it('rounds for display by unit and formats without trailing zeros', () => {
    expect(roundPressure(17.0449, 'inHg')).toBe(17);
    expect(roundPressure(0.98765, 'bar')).toBe(0.988);
    expect(formatNumber(17)).toBe('17');
    expect(formatNumber(-0.001)).toBe('0');
    expect(formatNumber(2.5)).toBe('2.5');
  });
});

describe('units overflow', () => {
  it('refuses a pressure whose pascal value overflows instead of returning Infinity', () => {
    expect(() => pressureToPa(1e308, 'psi', 'vacuum')).toThrow(expect.objectContaining({ field: 'vacuum', message: expect.stringMatching(/too large/) }));
  });
});
