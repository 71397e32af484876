import { describe, expect, it } from 'vitest';
import { walkPageId } from './walk-paths';

describe('walkPageId', () => {
  it("names the walk of a walk's own page, and nothing else", () => {
    expect(walkPageId('/walks/42')).toBe(42);
    expect(walkPageId('/walks/42/')).toBe(42);
    for (const p of ['/walks/42/report', '/walks/abc', '/walks/', '/jobs/42', '/walks/1234567890123']) expect(walkPageId(p), p).toBeUndefined();
  });
});
