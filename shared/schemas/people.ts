import { z } from 'zod';
import { ROLES } from '../roles';
import { emailSchema, linkTokenSchema, passwordSchema, personNameSchema } from './auth';

/** One person of the shop as the owner's People screen shows them. */
export const personSchema = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string(),
  role: z.enum(ROLES),
  active: z.boolean(),
  lastSignInAt: z.string().nullable(),
  createdAt: z.string(),
});
export type Person = z.infer<typeof personSchema>;

export const peopleAnswerSchema = z.object({ people: z.array(personSchema) });
export type PeopleAnswer = z.infer<typeof peopleAnswerSchema>;

/** PATCH /api/people/:id: change the role, deactivate or reactivate (owner only). */
export const personUpdateSchema = z
  .object({
    role: z.enum(ROLES, { message: 'Pick a role from the list.' }).optional(),
    active: z.boolean({ message: 'Say whether the person is active.' }).optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: 'Say what to change: the role or whether the person is active.' });
export type PersonUpdate = z.infer<typeof personUpdateSchema>;

/** A pending invitation. */
export const invitationSchema = z.object({
  id: z.number(),
  email: z.string(),
  role: z.enum(ROLES),
  invitedBy: z.string().nullable(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const invitationsAnswerSchema = z.object({ invitations: z.array(invitationSchema) });
export type InvitationsAnswer = z.infer<typeof invitationsAnswerSchema>;

/** POST /api/invitations (owner only). */
export const inviteSchema = z.object({
  email: emailSchema,
  role: z.enum(ROLES, { message: 'Pick a role from the list.' }),
});
export type Invite = z.infer<typeof inviteSchema>;

/** POST /api/invitations/lookup: what an invitation link is for, before accepting. */
export const invitationLookupSchema = z.object({ token: linkTokenSchema });
export const invitationLookupAnswerSchema = z.object({ email: z.string(), role: z.enum(ROLES), shopName: z.string() });
export type InvitationLookupAnswer = z.infer<typeof invitationLookupAnswerSchema>;

/** POST /api/invitations/accept: sets the name and password and signs in. */
export const acceptInvitationSchema = z.object({
  token: linkTokenSchema,
  name: personNameSchema,
  password: passwordSchema,
});
export type AcceptInvitation = z.infer<typeof acceptInvitationSchema>;
