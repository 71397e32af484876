import type { Request, Response, NextFunction } from 'express';
import type { PassportStatic } from 'passport';
import { signInSchema, signUpSchema, type SignUp } from '@/shared/schemas/auth';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';
import { AppError } from '../errors';
import { endSession, startSession } from '../auth/start-session';

/** Sign-up, sign-in, sign-out and "who am I". */
export const authRoutes = (s: Services, passport: PassportStatic): RouteDef[] => [
  {
    method: 'post',
    path: '/auth/sign-up',
    allow: 'public',
    body: signUpSchema,
    status: 201,
    handler: async ({ req, body }) => {
      const user = await s.auth.signUp(body as SignUp);
      await startSession(req, user);
      await s.auth.recordSignIn(user.id);
      return { user: await s.auth.me(user.id) };
    },
  },
  {
    method: 'post',
    path: '/auth/sign-in',
    allow: 'public',
    body: signInSchema,
    handler: async ({ req, res }) => {
      const user = await authenticate(passport, req, res);
      if (!user) throw new AppError(401, 'bad_credentials', 'That e-mail and password do not match an active account.');
      await startSession(req, user);
      await s.auth.recordSignIn(user.id);
      return { user: await s.auth.me(user.id) };
    },
  },
  {
    method: 'post',
    path: '/auth/sign-out',
    allow: 'public',
    handler: async ({ req, res }) => {
      await endSession(req);
      res.clearCookie('baywalk.sid');
      return { user: null };
    },
  },
  {
    method: 'get',
    path: '/auth/me',
    allow: 'public',
    handler: async ({ req }) => {
      const user = req.user as SessionUser | undefined;
      return { user: user ? await s.auth.me(user.id) : null };
    },
  },
];

function authenticate(passport: PassportStatic, req: Request, res: Response): Promise<SessionUser | false> {
  return new Promise((resolve, reject) => {
    const next: NextFunction = (err?: unknown) => (err ? reject(err) : resolve(false));
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) => {
      if (err) reject(err);
      else resolve(user);
    })(req, res, next);
  });
}
