import { describe, expect, it } from 'vitest';
import { decodeBaroKpa, decodeEngineRpm, decodeFuelTrimPct, decodeMapKpa, decodeMode01, decodeMode01Response } from '@/shared/readings';

// Source: SAE J1979 / ISO 15031-5, mode 01, as commonly documented:
// PIDs 06–09 trim = (A − 128)·100/128 %, 0B MAP = A kPa, 0C rpm = (256·A + B)/4, 33 baro = A kPa.
describe('SAE J1979 mode 01 worked examples', () => {
  const trims: Array<[number, number]> = [
    [0, -100],
    [96, -25],
    [128, 0],
    [160, 25],
    [255, 99.21875],
  ];
  for (const [a, pct] of trims) {
    it(`fuel trim byte A=${a} → ${pct} % (SAE J1979 PIDs 06–09)`, () => {
      expect(decodeFuelTrimPct(a)).toBe(pct);
    });
  }

  it('engine speed 0x0C 0x80 → 800 rpm and 0x1A 0xF8 → 1 726 rpm (SAE J1979 PID 0C)', () => {
    expect(decodeEngineRpm(0x0c, 0x80)).toBe(800);
    expect(decodeEngineRpm(0x1a, 0xf8)).toBe(1726);
    expect(decodeEngineRpm(0xff, 0xff)).toBe(16_383.75); // top of the range, SAE J1979
  });

  it('MAP (PID 0B) and barometric pressure (PID 33) are A kPa, 0–255 (SAE J1979)', () => {
    expect(decodeMapKpa(0)).toBe(0);
    expect(decodeMapKpa(34)).toBe(34);
    expect(decodeBaroKpa(101)).toBe(101);
    expect(decodeBaroKpa(255)).toBe(255);
  });

  it('decodes whole answers: "41 0C 1A F8" → 1 726 rpm, "41 06 A0" → +25 % bank 1 short term (SAE J1979)', () => {
    expect(decodeMode01Response('41 0C 1A F8')).toEqual({ pid: 0x0c, name: 'Engine speed', value: 1726, unit: 'rpm' });
    expect(decodeMode01Response('4106A0').value).toBe(25);
    expect(decodeMode01(0x09, [96])).toMatchObject({ name: 'Long term fuel trim, bank 2', value: -25, unit: '%' });
    expect(decodeMode01(0x33, [84])).toMatchObject({ value: 84, unit: 'kPa' });
  });

  it('a positive trim means fuel is being added, negative removed (SAE J1979 sign convention)', () => {
    expect(decodeFuelTrimPct(160)).toBeGreaterThan(0);
    expect(decodeFuelTrimPct(96)).toBeLessThan(0);
  });
});
