import { describe, expect, it } from 'vitest';
import { day, duration, isIsoDay, percent, presetRange, steps } from './format';

describe('Patterns display helpers', () => {
  it('writes shares, durations and steps for people', () => {
    expect(percent(5 / 13)).toBe('38 %');
    expect(percent(0.0408)).toBe('4.1 %');
    expect(percent(0)).toBe('0 %');
    expect(duration(1950)).toBe('33 min');
    expect(duration(3 * 3600 + 5 * 60)).toBe('3 h 05 min');
    expect(steps(6)).toBe('6');
    expect(steps(8.4)).toBe('8.4');
  });

  it('writes days in UTC and checks typed dates', () => {
    expect(day('2026-03-02')).toBe('2 Mar 2026');
    expect(day('2026-03-29T23:59:00.000Z', false)).toBe('29 Mar');
    expect(isIsoDay('2026-02-28')).toBe(true);
    expect(isIsoDay('2026-02-30')).toBe(false);
    expect(isIsoDay('2026-2-3')).toBe(false);
  });

  it('turns a preset into a range ending today, both days included', () => {
    expect(presetRange('4w', new Date('2026-03-29T15:00:00Z'))).toEqual({ from: '2026-03-02', to: '2026-03-29' });
    expect(presetRange('26w', new Date('2026-12-01T10:00:00Z'))).toEqual({ from: '2026-06-03', to: '2026-12-01' });
  });
});
