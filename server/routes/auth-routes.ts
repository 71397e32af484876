import type { Request, Response, NextFunction } from 'express';
import type { PassportStatic } from 'passport';
import {
  FORGOT_PASSWORD_ANSWER,
  forgotPasswordSchema,
  resetCheckSchema,
  resetPasswordSchema,
  signInSchema,
  signUpSchema,
  type ForgotPassword,
  type ResetPassword,
  type SignUp,
} from '@/shared/schemas/auth';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';
import { AppError } from '../errors';
import { endSession, logInAs } from '../auth/start-session';

/** Sign-up, sign-in, sign-out, "who am I" and password reset. */
export const authRoutes = (s: Services, passport: PassportStatic): RouteDef[] => [
  {
    method: 'post',
    path: '/auth/sign-up',
    allow: 'public',
    before: s.limiters.signUp,
    body: signUpSchema,
    status: 201,
    handler: async ({ req, body }) => {
      const user = await s.auth.signUp(body as SignUp);
      return logInAs(req, s.auth, user);
    },
  },
  {
    method: 'post',
    path: '/auth/sign-in',
    allow: 'public',
    before: s.limiters.signIn,
    body: signInSchema,
    handler: async ({ req, res }) => {
      const user = await authenticate(passport, req, res);
      if (!user) throw new AppError(401, 'bad_credentials', 'That e-mail and password do not match an active account.');
      return logInAs(req, s.auth, user);
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
    method: 'post',
    path: '/auth/forgot-password',
    allow: 'public',
    before: s.limiters.passwordReset,
    body: forgotPasswordSchema,
    handler: async ({ req, body }) => {
      await s.passwordResets.request((body as ForgotPassword).email, requestOrigin(req));
      return { message: FORGOT_PASSWORD_ANSWER };
    },
  },
  {
    method: 'post',
    path: '/auth/reset-password/check',
    allow: 'public',
    body: resetCheckSchema,
    handler: ({ body }) => s.passwordResets.check((body as { token: string }).token),
  },
  {
    method: 'post',
    path: '/auth/reset-password',
    allow: 'public',
    body: resetPasswordSchema,
    handler: async ({ req, body }) => {
      const user = await s.passwordResets.complete(body as ResetPassword);
      return logInAs(req, s.auth, user);
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

/** The origin this request came to; links in mail use it unless BAYWALK_PUBLIC_URL is set. */
export function requestOrigin(req: Request): string {
  return `${req.protocol}://${req.get('host')}`;
}

function authenticate(passport: PassportStatic, req: Request, res: Response): Promise<SessionUser | false> {
  return new Promise((resolve, reject) => {
    const next: NextFunction = (err?: unknown) => (err ? reject(err) : resolve(false));
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) => {
      if (err) reject(err);
      else resolve(user);
    })(req, res, next);
  });
}
