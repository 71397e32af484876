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
