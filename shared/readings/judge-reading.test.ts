import { describe, expect, it } from 'vitest';
import { judgeReading } from './judge-reading';
import { VERDICTS } from './reading-kinds';

const rangeParams = { kind: 'range', quantity: 'Fuel rail pressure', unit: 'psi', min: 40, max: 45 } as const;

describe('judgeReading (the tree guard)', () => {
  it('idle vacuum: defaults to inHg and the stock profile; the input profile beats the step profile', () => {
    expect(judgeReading({ kind: 'idle_vacuum' }, { value: 18 }, {}).verdict).toBe('within_range');
    const stepLong = judgeReading({ kind: 'idle_vacuum', profile: 'long_duration_cam' }, { value: 12 }, {});
    expect(stepLong.verdict).toBe('within_range');
    expect(judgeReading({ kind: 'idle_vacuum', profile: 'long_duration_cam' }, { value: 12, profile: 'stock' }, {}).verdict).toBe('low');
  });

  it('idle vacuum uses the altitude or the measured barometric pressure', () => {
    expect(judgeReading({ kind: 'idle_vacuum' }, { value: 14 }, { altitudeM: 0 }).verdict).toBe('low');
    const high = judgeReading({ kind: 'idle_vacuum' }, { value: 14 }, { altitudeM: 1500 });
    expect(high.verdict).toBe('within_range');
    expect(high.expected).toEqual({ low: 12, high: 16, unit: 'inHg' });
    expect(judgeReading({ kind: 'idle_vacuum' }, { value: 14 }, { altitudeM: 0, baroKpa: 84.56 }).verdict).toBe('within_range');
  });

  it('idle vacuum gives every verdict the contract lists', () => {
    const seen = new Set([3, 15, 19, 23].map((v) => judgeReading({ kind: 'idle_vacuum' }, { value: v }, {}).verdict));
    expect([...seen].sort()).toEqual([...VERDICTS.idle_vacuum].sort());
  });

  it('idle vacuum refuses an unknown unit and an impossible value, naming the field', () => {
    expect(() => judgeReading({ kind: 'idle_vacuum' }, { value: 18, unit: 'atm' }, {})).toThrow(expect.objectContaining({ field: 'unit' }));
    expect(() => judgeReading({ kind: 'idle_vacuum' }, { value: 40 }, {})).toThrow(expect.objectContaining({ field: 'vacuum' }));
    expect(() => judgeReading({ kind: 'idle_vacuum' }, { value: Number.NaN }, {})).toThrow(expect.objectContaining({ field: 'value' }));
  });

  it('fuel trim: every verdict, with idle and 2 500 rpm leading with different causes', () => {
    const params = (rpm: 'idle' | '2500') => ({ kind: 'fuel_trim', rpm }) as const;
    const verdicts = [-30, -15, 0, 15, 30].map((v) => judgeReading(params('idle'), { value: v }, {}).verdict);
    expect(verdicts).toEqual(['code_rich', 'rich', 'normal', 'lean', 'code_lean']);
    expect(judgeReading(params('idle'), { value: 15 }, {}).causes?.[0].cause).toMatch(/unmetered air/i);
    expect(judgeReading(params('2500'), { value: 15 }, {}).causes?.[0].cause).toMatch(/fuel supply/i);
    expect(judgeReading(params('idle'), { value: -15 }, {}).causes?.[0].cause).toMatch(/too much fuel/i);
    expect(judgeReading(params('idle'), { value: 0 }, {}).causes).toEqual([]);
    expect(judgeReading(params('idle'), { value: 30 }, {}).summary).toMatch(/usually sets a trouble code/);
    expect(judgeReading({ kind: 'fuel_trim', rpm: 'idle' }, { value: 5 }, {}).expected).toEqual({ low: -10, high: 10, unit: '%' });
  });

  it('fuel trim refuses a non-percent unit and impossible totals', () => {
    expect(() => judgeReading({ kind: 'fuel_trim', rpm: 'idle' }, { value: 5, unit: 'kPa' }, {})).toThrow(expect.objectContaining({ field: 'unit' }));
    expect(() => judgeReading({ kind: 'fuel_trim', rpm: 'idle' }, { value: 250 }, {})).toThrow(expect.objectContaining({ field: 'value' }));
  });

  it('range: ends are within; below and above outside', () => {
    expect(judgeReading(rangeParams, { value: 40 }, {}).verdict).toBe('within');
    expect(judgeReading(rangeParams, { value: 45 }, {}).verdict).toBe('within');
    expect(judgeReading(rangeParams, { value: 39.9 }, {}).verdict).toBe('below');
    expect(judgeReading(rangeParams, { value: 45.1 }, {}).verdict).toBe('above');
    expect(judgeReading(rangeParams, { value: 42 }, {}).expected).toEqual({ low: 40, high: 45, unit: 'psi' });
  });

  it('range converts pressure units and refuses units it cannot convert or an upside-down band', () => {
    expect(judgeReading(rangeParams, { value: 300, unit: 'kPa' }, {}).verdict).toBe('within'); // 300 kPa = 43.5 psi
    expect(judgeReading(rangeParams, { value: 42, unit: 'psi' }, {}).verdict).toBe('within');
    expect(() => judgeReading(rangeParams, { value: 12, unit: 'V' }, {})).toThrow(expect.objectContaining({ field: 'unit' }));
    expect(() => judgeReading({ ...rangeParams, min: 50 }, { value: 12 }, {})).toThrow(expect.objectContaining({ field: 'params' }));
    const volts = { kind: 'range', quantity: 'Battery voltage', unit: 'V', min: 12.4, max: 12.8 } as const;
    expect(judgeReading(volts, { value: 12.1, unit: 'V' }, {}).verdict).toBe('below');
  });
});
