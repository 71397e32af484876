import { describe, expect, it } from 'vitest';
import { feetToMetres, metresToFeet, shortDateTime } from './format';

describe('settings formatting', () => {
  // The international foot is defined as exactly 0.3048 m (international yard and pound agreement, 1959; NIST SP 811 appendix B).
  it('converts altitude between metres and feet with the exact foot', () => {
    expect(metresToFeet(1609)).toBe(5279);
    expect(feetToMetres(5280)).toBe(1609);
    expect(feetToMetres(metresToFeet(1100))).toBe(1100);
    expect(metresToFeet(0)).toBe(0);
  });

  it('says "Never" for a person who has not signed in', () => {
    expect(shortDateTime(null)).toBe('Never');
    expect(shortDateTime('not a date')).toBe('Never');
    expect(shortDateTime('2026-12-03T14:05:00Z')).toMatch(/2026/);
  });
});
