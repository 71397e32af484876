import type { Me } from '@/shared/schemas/auth';

/** Auth screens only an anonymous person needs; a signed-in person is sent on. */
const ANONYMOUS_ONLY = new Set(['sign-in', 'sign-up', 'forgot-password']);

/** A `next` path is followed only when it stays on this site and is not an auth screen. */
export function safeNext(next: unknown): string | undefined {
  if (typeof next !== 'string' || !next.startsWith('/') || next.startsWith('//') || next.includes('\\')) return undefined;
  const first = next.split(/[/?#]/)[1] ?? '';
  // A guest link (/g/<token>) is never a place to send staff after signing in, nor a token to carry in a URL.
  if (ANONYMOUS_ONLY.has(first) || first === 'reset-password' || first === 'accept-invite' || first === 'g') return undefined;
  return next;
}

/**
 * Where the sign-in gate sends a person, or undefined to stay.
 * - signed-in screens (the `(app)` group) need a session: anonymous people go
 *   to /sign-in, remembering where they were;
 * - sign-in, sign-up and forgot-password are for anonymous people: a
 *   signed-in person goes to `next` or home;
 * - reset-password and accept-invite work either way (a link opened in a
 *   browser where someone else is signed in), as do public pages.
 * `user` undefined means "not known yet": never redirect on a guess.
 */
export interface GateTarget {
  pathname: string;
  params?: { next: string };
}

export function gateRedirect(input: {
  user: Me | null | undefined;
  segments: readonly string[];
  pathname: string;
  next?: unknown;
  /** Where the page was first opened (see deep-link.ts), used when the router has fallen back to `/`. */
  deepLink?: string;
}): GateTarget | undefined {
  const { user, segments, pathname } = input;
  if (user === undefined) return undefined;
  const group = segments[0];
  // Guest links (app/g/): no account, so never redirected, whoever is signed in here.
  if (group === 'g') return undefined;
  if (group === '(app)' && !user) {
    const next = pathname && pathname !== '/' ? pathname : safeNext(input.deepLink);
    return next ? { pathname: '/sign-in', params: { next } } : { pathname: '/sign-in' };
  }
  if (group === '(auth)' && user && ANONYMOUS_ONLY.has(segments[1] ?? '')) {
    return { pathname: safeNext(input.next) ?? '/' };
  }
  return undefined;
}
