import type { Request } from 'express';
import type { SessionUser } from '../http/access';
import { unauthenticated } from '../errors';

/**
 * The signed-in person of a request, for handlers behind a role-checked route.
 * Pass `user.shopId` to services so every query stays inside the caller's shop.
 */
export function currentUser(req: Request): SessionUser {
  const user = req.user as SessionUser | undefined;
  if (!user) throw unauthenticated();
  return user;
}
