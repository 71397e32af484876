import { afterEach, describe, expect, it, vi } from 'vitest';
import { forgetEarlyResponses, takeEarlyResponse } from './early-requests';

/** What public/early-requests.js leaves on the page. */
function pageStarted(paths: string[], startedAt = Date.now()) {
  const requests = Object.fromEntries(paths.map((p) => [p, Promise.resolve(new Response(JSON.stringify({ path: p })))]));
  vi.stubGlobal('window', { __baywalkEarly: { startedAt, requests } });
}

describe('early API answers', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('hands each answer out once, to the same path only', async () => {
    pageStarted(['/auth/me', '/walks/7']);
    expect(takeEarlyResponse('/walks/8')).toBeUndefined();
    const walk = takeEarlyResponse('/walks/7');
    expect(await (await walk!).json()).toEqual({ path: '/walks/7' });
    expect(takeEarlyResponse('/walks/7')).toBeUndefined();
    expect(takeEarlyResponse('/auth/me')).toBeDefined();
  });

  it('never hands out an answer older than 30 s, or any after a write', () => {
    pageStarted(['/auth/me'], Date.now() - 31_000);
    expect(takeEarlyResponse('/auth/me')).toBeUndefined();
    pageStarted(['/auth/me', '/walks/7']);
    forgetEarlyResponses();
    expect(takeEarlyResponse('/auth/me')).toBeUndefined();
    expect(takeEarlyResponse('/walks/7')).toBeUndefined();
  });

  it('has nothing to give where the page script did not run (tests, native)', () => {
    expect(takeEarlyResponse('/auth/me')).toBeUndefined();
    expect(() => forgetEarlyResponses()).not.toThrow();
  });
});
