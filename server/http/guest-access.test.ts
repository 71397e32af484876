import { describe, expect, it } from 'vitest';
import type { Request } from 'express';
import { cookieValues, GUEST_COOKIE, signBinding, verifyBinding } from './guest-access';
import { guestLinkStatus } from '../services/guest-link-service';

const req = (cookie?: string) => ({ headers: cookie === undefined ? {} : { cookie } }) as unknown as Request;

describe('guest binding cookie', () => {
  it('verifies only values signed with this secret, for the link they name', () => {
    const value = signBinding('secret-a', 42);
    expect(verifyBinding('secret-a', value)).toBe(42);
    expect(verifyBinding('secret-b', value)).toBeUndefined();
    // Another link id with the same signature is refused.
    expect(verifyBinding('secret-a', value.replace(/^42\./, '43.'))).toBeUndefined();
    for (const bad of ['', '42', '42.', 'x.y', `42.${'A'.repeat(43)}`, `${value}x`]) expect(verifyBinding('secret-a', bad)).toBeUndefined();
  });

  it('reads every value of the cookie, ignoring others and malformed ones', () => {
    expect(cookieValues(req(), GUEST_COOKIE)).toEqual([]);
    expect(cookieValues(req(`a=1; ${GUEST_COOKIE}=one; b=2; ${GUEST_COOKIE}=two%2E`), GUEST_COOKIE)).toEqual(['one', 'two.']);
    expect(cookieValues(req(`${GUEST_COOKIE}=%E0%A4%A`), GUEST_COOKIE)).toEqual([]);
    expect(cookieValues(req(`x${GUEST_COOKIE}=no`), GUEST_COOKIE)).toEqual([]);
  });
});

describe('guest link status', () => {
  const now = Date.parse('2026-12-01T12:00:00Z');
  const base = { revoked_at: null, walk_status: null, opened_at: null, expires_at: new Date(now + 60_000) } as const;
  it('orders revoked, finished, expired, in progress, not opened', () => {
    expect(guestLinkStatus(base, now)).toBe('not_opened');
    expect(guestLinkStatus({ ...base, opened_at: new Date(now) }, now)).toBe('in_progress');
    expect(guestLinkStatus({ ...base, expires_at: new Date(now) }, now)).toBe('expired');
    // A walk finished before the link ran out stays "finished".
    expect(guestLinkStatus({ ...base, walk_status: 'finished', expires_at: new Date(now - 1) }, now)).toBe('finished');
    expect(guestLinkStatus({ ...base, walk_status: 'finished', revoked_at: new Date(now) }, now)).toBe('revoked');
  });
});
