/// <reference types="node" />
import crypto from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { AppError, forbidden, unauthenticated } from '../errors';

/**
 * The access value of routes served to a customer holding a guest link:
 * `allow: GUEST_ONLY`. Such a route is refused to every staff session and to
 * anyone whose browser the link has not bound (deny by default).
 */
export const GUEST = 'guest';
export const GUEST_ONLY: readonly string[] = [GUEST];

/** The cookie that binds a browser to one guest link (and so to its walk). */
export const GUEST_COOKIE = 'baywalk.guest';

/** Guest API paths of one link; the binding cookie is scoped to this path so it reaches nothing else. */
export const guestLinkPath = (linkId: number) => `/api/guest/links/${linkId}`;

/** What a verified binding tells the handlers. */
export interface GuestBinding {
  linkId: number;
}

const needLink = () => unauthenticated('Open the link the shop sent you to continue. This page only works from that link.');
const notForStaff = () =>
  forbidden('Guest pages are for the customer who holds the link. Staff see guest walks under Support; to try a link, open it in a private window.');

/** Every value of a cookie in the request (a browser may send several with the same name for different paths). */
export function cookieValues(req: Request, name: string): string[] {
  const header = req.headers.cookie;
  if (!header) return [];
  const out: string[] = [];
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    try {
      out.push(decodeURIComponent(part.slice(eq + 1).trim()));
    } catch {
      // A malformed value is simply not a binding.
    }
  }
  return out;
}

const hmac = (secret: string, payload: string) => crypto.createHmac('sha256', `guest-binding:${secret}`).update(payload).digest('base64url');

/** The cookie value for a link: its id and an HMAC of it, so a browser cannot name another link. */
export function signBinding(secret: string, linkId: number): string {
  return `${linkId}.${hmac(secret, `link:${linkId}`)}`;
}

/** The link id a cookie value names, when its signature is right. */
export function verifyBinding(secret: string, value: string): number | undefined {
  const m = /^(\d{1,10})\.([A-Za-z0-9_-]{43})$/.exec(value);
  if (!m) return undefined;
  const expected = Buffer.from(hmac(secret, `link:${m[1]}`));
  const given = Buffer.from(m[2]);
  return given.length === expected.length && crypto.timingSafeEqual(given, expected) ? Number(m[1]) : undefined;
}

/** Sets the binding cookie: httpOnly, SameSite=Lax, scoped to this link's guest API path, until the link expires. */
export function setBindingCookie(res: Response, opts: { secret: string; linkId: number; expiresAt: Date; secure: boolean }) {
  res.cookie(GUEST_COOKIE, signBinding(opts.secret, opts.linkId), {
    httpOnly: true,
    sameSite: 'lax',
    secure: opts.secure,
    path: guestLinkPath(opts.linkId),
    expires: opts.expiresAt,
  });
}

/**
 * The access check for guest routes, used by access.ts: staff sessions are
 * refused (403); a request with no binding cookie at all is told to open its
 * link (401). The signature and the link itself are checked next by the
 * route's binding middleware (`guestBinding`).
 */
export const guestGuard: RequestHandler = (req, _res, next) => {
  if (req.user) return next(notForStaff());
  if (cookieValues(req, GUEST_COOKIE).length === 0) return next(needLink());
  next();
};

/**
 * Verifies the binding cookie against the link named in the path and stores
 * it on the request. A cookie for another link, or one not signed by this
 * server, is refused: one guest can never reach another guest's walk.
 */
export function guestBinding(secret: string): RequestHandler {
  return (req, _res, next) => {
    const wanted = Number(req.params.linkId);
    const bound = cookieValues(req, GUEST_COOKIE).map((v) => verifyBinding(secret, v));
    if (bound.includes(wanted) && Number.isSafeInteger(wanted)) {
      (req as Request & { guest?: GuestBinding }).guest = { linkId: wanted };
      return next();
    }
    if (bound.some((id) => id !== undefined)) return next(new AppError(403, 'forbidden', 'This browser is bound to another guest link. Open the link the shop sent you for this walk.'));
    next(needLink());
  };
}

/** The verified guest of a request, for handlers behind guestBinding. */
export function guestOf(req: Request): GuestBinding {
  const guest = (req as Request & { guest?: GuestBinding }).guest;
  if (!guest) throw needLink();
  return guest;
}
