import type {} from 'passport';
import type { RequestHandler } from 'express';
import type { Access, AccessGuard } from './route-table';
import { forbidden, unauthenticated } from '../errors';
import { GUEST, guestGuard } from './guest-access';

/** The signed-in person as the access check sees them. */
export interface SessionUser {
  id: number;
  shopId: number;
  role: string;
  /** Loaded with the session (passport-setup.ts); absent only right after sign-in. */
  name?: string;
}

/**
 * Deny by default: public routes pass; guest routes (`allow: GUEST_ONLY`) go to
 * the guest guard and are never open to staff; others need a signed-in user
 * whose role is listed.
 */
export const accessGuard: AccessGuard = (allow: Access): RequestHandler => (req, res, next) => {
  if (allow === 'public') return next();
  if (allow.includes(GUEST)) return guestGuard(req, res, next);
  const user = req.user as SessionUser | undefined;
  if (!user) return next(unauthenticated());
  if (!allow.includes(user.role)) return next(forbidden());
  next();
};
