import { z } from 'zod';
import { ROLES } from '../roles';

export const emailSchema = z.string().trim().toLowerCase().max(254, 'That address is too long.').email('Enter a valid e-mail address.');
export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.');

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(200, 'That password is too long.'),
});
export type SignIn = z.infer<typeof signInSchema>;

/** The signed-in person as the client sees them. */
export const meSchema = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  shop: z.object({ id: z.number(), name: z.string() }),
});
export type Me = z.infer<typeof meSchema>;

export const meAnswerSchema = z.object({ user: meSchema.nullable() });
export type MeAnswer = z.infer<typeof meAnswerSchema>;

export const personNameSchema = z.string().trim().min(1, 'Enter your name.').max(120, 'Use at most 120 characters.');

/** POST /api/auth/sign-up: a new shop and its first owner. */
export const signUpSchema = z.object({
  shopName: z.string().trim().min(2, 'Enter the shop name (at least 2 characters).').max(120, 'Use at most 120 characters.'),
  name: personNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignUp = z.infer<typeof signUpSchema>;

/** A single-use link token as it arrives from a mail link (43 characters of base64url). */
export const linkTokenSchema = z
  .string({ message: 'The link is missing its code. Open the link from the e-mail again.' })
  .trim()
  .regex(/^[A-Za-z0-9_-]{20,100}$/, 'This link is not complete. Open the link from the e-mail again, or ask for a new one.');

/** POST /api/auth/forgot-password. */
export const forgotPasswordSchema = z.object({ email: emailSchema });
export type ForgotPassword = z.infer<typeof forgotPasswordSchema>;

/** POST /api/auth/reset-password/check: is this reset link still good? */
export const resetCheckSchema = z.object({ token: linkTokenSchema });

/** POST /api/auth/reset-password. */
export const resetPasswordSchema = z.object({ token: linkTokenSchema, password: passwordSchema });
export type ResetPassword = z.infer<typeof resetPasswordSchema>;

export const resetCheckAnswerSchema = z.object({ email: z.string(), shopName: z.string() });
export type ResetCheckAnswer = z.infer<typeof resetCheckAnswerSchema>;

/** The one answer to "forgot password", whether or not the address has an account. */
export const FORGOT_PASSWORD_ANSWER =
  'If that address belongs to an active Baywalk account, a link to choose a new password is on its way. It works for one hour.';
