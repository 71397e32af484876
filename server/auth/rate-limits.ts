import type { Request, RequestHandler } from 'express';
import type { Knex } from 'knex';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Config } from '../config';
import { tooMany } from '../errors';
import { KnexRateLimitStore } from './rate-limit-store';

/** The e-mail a sign-in or reset request names, normalised; undefined when absent. */
function accountKey(req: Request): string | undefined {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' && email.trim() ? email.trim().toLowerCase().slice(0, 254) : undefined;
}

const minutesLeft = (req: Request) => {
  const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
  return Math.max(1, Math.ceil(((reset?.getTime() ?? Date.now() + 60_000) - Date.now()) / 60_000));
};

function limiter(knex: Knex, opts: { prefix: string; windowMs: number; limit: number; byAccount: boolean; onlyFailures: boolean; message: (minutes: number) => string }): RequestHandler {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    store: new KnexRateLimitStore(knex, opts.prefix),
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: opts.onlyFailures,
    // IPv6 clients are grouped by /56 network, as express-rate-limit advises.
    keyGenerator: (req) => (opts.byAccount ? (accountKey(req) ?? '') : ipKeyGenerator(req.ip ?? 'unknown')),
    skip: (req) => opts.byAccount && !accountKey(req),
    handler: (req, _res, next) => next(tooMany(opts.message(minutesLeft(req)))),
    // A database hiccup must not lock everybody out of signing in.
    passOnStoreError: true,
  });
}

/**
 * Rate limits for sign-in (failed attempts only) and password-reset requests,
 * per IP address and per account, and for new shops per IP address (each
 * sign-up hashes a password and writes a shop with its tree library),
 * counted in MariaDB. Limits come from
 * config.rateLimits (see the README's configuration table).
 */
export function createAuthLimiters(knex: Knex, limits: Config['rateLimits']) {
  const signInMessage = (m: number) => `Too many sign-in attempts. Wait ${m} minute${m === 1 ? '' : 's'} and try again, or reset your password.`;
  const resetMessage = (m: number) => `Too many password reset requests. Wait ${m} minute${m === 1 ? '' : 's'} and try again.`;
  const signUpMessage = (m: number) => `Too many new shops from this network. Wait ${m} minute${m === 1 ? '' : 's'} and try again, or ask the shop's owner to invite you.`;
  return {
    signIn: [
      limiter(knex, { prefix: 'signin-ip:', windowMs: limits.signInWindowMs, limit: limits.signInPerIp, byAccount: false, onlyFailures: true, message: signInMessage }),
      limiter(knex, { prefix: 'signin-account:', windowMs: limits.signInWindowMs, limit: limits.signInPerAccount, byAccount: true, onlyFailures: true, message: signInMessage }),
    ],
    passwordReset: [
      limiter(knex, { prefix: 'reset-ip:', windowMs: limits.resetWindowMs, limit: limits.resetPerIp, byAccount: false, onlyFailures: false, message: resetMessage }),
      limiter(knex, { prefix: 'reset-account:', windowMs: limits.resetWindowMs, limit: limits.resetPerAccount, byAccount: true, onlyFailures: false, message: resetMessage }),
    ],
    // Refused attempts (a taken address, a weak password) count too: only the address is known before the work.
    signUp: [limiter(knex, { prefix: 'signup-ip:', windowMs: limits.signUpWindowMs, limit: limits.signUpPerIp, byAccount: false, onlyFailures: false, message: signUpMessage })],
  };
}
