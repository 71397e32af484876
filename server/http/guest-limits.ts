/// <reference types="node" />
import type { Request, RequestHandler } from 'express';
import type { Knex } from 'knex';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { tooMany } from '../errors';
import { KnexRateLimitStore } from '../auth/rate-limit-store';
import { hashLinkToken } from '../auth/link-tokens';

/** Caps on one guest walk: step records (answers and undos), photos, and bytes per photo. */
export const GUEST_CAPS = { maxSteps: 150, maxPhotos: 12, maxPhotoBytes: 6 * 1024 * 1024 } as const;

/**
 * Rate limits on guest routes, per address and per link, counted in MariaDB
 * (shared by every server process). Each can be set with an environment
 * variable; under NODE_ENV=test the defaults are 1000 times higher so suites
 * that walk from 127.0.0.1 never trip them (the rate-limit test sets low ones).
 */
export function guestLimits(env: NodeJS.ProcessEnv = process.env) {
  const scale = env.NODE_ENV === 'test' ? 1000 : 1;
  const n = (name: string, fallback: number) => Number(env[name] ?? fallback * scale);
  return {
    windowMs: Number(env.BAYWALK_GUEST_LIMIT_WINDOW_MS ?? 15 * 60_000),
    /** Link openings per address: also what stops token guessing. */
    openPerIp: n('BAYWALK_GUEST_LIMIT_OPEN_IP', 30),
    /** Openings of one token. */
    openPerToken: n('BAYWALK_GUEST_LIMIT_OPEN_TOKEN', 20),
    /** Any guest call per address (a walk page, its answers, its photos). */
    perIp: n('BAYWALK_GUEST_LIMIT_IP', 600),
    /** Any guest call for one link. */
    perLink: n('BAYWALK_GUEST_LIMIT_LINK', 400),
    /** Photo uploads for one link. */
    photosPerLink: n('BAYWALK_GUEST_LIMIT_PHOTOS', 30),
  };
}
export type GuestLimits = ReturnType<typeof guestLimits>;

const minutesLeft = (req: Request) => {
  const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
  return Math.max(1, Math.ceil(((reset?.getTime() ?? Date.now() + 60_000) - Date.now()) / 60_000));
};
const wait = (m: number) => `Wait ${m} minute${m === 1 ? '' : 's'} and try again`;

function limiter(knex: Knex, prefix: string, windowMs: number, limit: number, key: (req: Request) => string | undefined, message: (m: number) => string): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    store: new KnexRateLimitStore(knex, prefix),
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => key(req) ?? '',
    skip: (req) => key(req) === undefined,
    handler: (req, _res, next) => next(tooMany(message(minutesLeft(req)))),
    // A database hiccup must not lock customers out of their walk.
    passOnStoreError: true,
  });
}

const byIp = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
const byToken = (req: Request) => {
  const token = (req.body as { token?: unknown } | undefined)?.token;
  return typeof token === 'string' && token.length > 0 && token.length <= 200 ? hashLinkToken(token) : undefined;
};
const byLink = (req: Request) => {
  const id = req.params.linkId;
  return typeof id === 'string' && /^\d{1,10}$/.test(id) ? id : undefined;
};

/** The limiter middleware for the guest routes. */
export function createGuestLimiters(knex: Knex, limits: GuestLimits) {
  const w = limits.windowMs;
  return {
    /** Opening a link: per address and per token. */
    open: [
      limiter(knex, 'guest-open-ip:', w, limits.openPerIp, byIp, (m) => `Too many links opened from this address. ${wait(m)}.`),
      limiter(knex, 'guest-open-token:', w, limits.openPerToken, byToken, (m) => `This link was opened too many times in a short while. ${wait(m)}.`),
    ],
    /** Before the binding check: every guest call from one address. */
    perIp: limiter(knex, 'guest-ip:', w, limits.perIp, byIp, (m) => `Too many requests from this address. ${wait(m)}; everything you recorded so far is saved.`),
    /** After the binding check: every call for one link. */
    perLink: limiter(knex, 'guest-link:', w, limits.perLink, byLink, (m) => `Too many requests for this walk. ${wait(m)}; everything you recorded so far is saved.`),
    /** Photo uploads for one link, on top of the rest. */
    photos: limiter(knex, 'guest-photo:', 60 * 60_000, limits.photosPerLink, byLink, (m) => `Too many photos sent for this walk. ${wait(m)}; the photos already sent are saved.`),
  };
}
