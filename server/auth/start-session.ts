import type { Request } from 'express';
import type { Me } from '@/shared/schemas/auth';
import type { SessionUser } from '../http/access';

/** The part of the auth service a sign-in needs. */
interface SignInRecords {
  recordSignIn(userId: number): Promise<unknown>;
  me(userId: number): Promise<Me>;
}

/**
 * Signs a person into this request's session. passport 0.7 regenerates the
 * session id inside logIn, so an id planted before sign-in is never reused.
 */
export function startSession(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

/**
 * Logs a person in after they proved who they are (password, invitation,
 * reset link): a fresh session, the sign-in time recorded, and the answer
 * every sign-in route gives.
 */
export async function logInAs(req: Request, auth: SignInRecords, user: SessionUser): Promise<{ user: Me }> {
  await startSession(req, user);
  await auth.recordSignIn(user.id);
  return { user: await auth.me(user.id) };
}

/** Ends the session: passport forgets the user, the session row is deleted. */
export async function endSession(req: Request): Promise<void> {
  await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
  await new Promise<void>((resolve) => (req.session ? req.session.destroy(() => resolve()) : resolve()));
}
