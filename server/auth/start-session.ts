import type { Request } from 'express';
import type { SessionUser } from '../http/access';

/**
 * Signs a person into this request's session. passport 0.7 regenerates the
 * session id inside logIn, so an id planted before sign-in is never reused.
 */
export function startSession(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

/** Ends the session: passport forgets the user, the session row is deleted. */
export async function endSession(req: Request): Promise<void> {
  await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
  await new Promise<void>((resolve) => (req.session ? req.session.destroy(() => resolve()) : resolve()));
}
