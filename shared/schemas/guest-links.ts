/** Request and answer shapes of guest links: the staff side (/api/guest-links) and the guest side (/api/guest/...). */
import { z } from 'zod';
import { optionalText } from './fields';
import { walkDetailSchema } from './walks';
import { jobSchema } from './jobs';

/** Days a link lasts by default, and at most. */
export const GUEST_LINK_DEFAULT_DAYS = 7;
export const GUEST_LINK_MAX_DAYS = 30;

export const GUEST_LINK_STATUSES = ['not_opened', 'in_progress', 'finished', 'expired', 'revoked'] as const;
export type GuestLinkStatus = (typeof GUEST_LINK_STATUSES)[number];
export const GUEST_LINK_STATUS_LABELS: Record<GuestLinkStatus, string> = {
  not_opened: 'Not opened',
  in_progress: 'In progress',
  finished: 'Finished',
  expired: 'Expired',
  revoked: 'Revoked',
};

/** POST /api/guest-links: a published tree for one customer; e-mailed when `send` is true. */
export const guestLinkCreateSchema = z
  .object({
    treeId: z.number({ message: 'Choose the tree to send.' }).int().positive('Choose the tree to send.'),
    customerName: z.string().trim().min(1, "Enter the customer's name.").max(120, 'Keep the name under 120 characters.'),
    customerEmail: z
      .string()
      .trim()
      .toLowerCase()
      .max(254, 'That address is too long.')
      .refine((v) => v === '' || z.email().safeParse(v).success, 'Enter an e-mail address like name@example.com, or leave it empty.')
      .nullish()
      .transform((v) => (v ? v : null)),
    expiresInDays: z
      .number({ message: 'Enter the number of days the link lasts.' })
      .int('Enter whole days.')
      .min(1, 'A link lasts at least 1 day.')
      .max(GUEST_LINK_MAX_DAYS, `A link lasts at most ${GUEST_LINK_MAX_DAYS} days.`)
      .default(GUEST_LINK_DEFAULT_DAYS),
    note: optionalText(2000, 'Keep the note under 2000 characters.'),
    send: z.boolean().default(false),
  })
  .superRefine((v, ctx) => {
    if (v.send && !v.customerEmail) ctx.addIssue({ code: 'custom', path: ['customerEmail'], message: 'Enter the e-mail address to send the link to, or copy the link instead.' });
  });
export type GuestLinkCreate = z.input<typeof guestLinkCreateSchema>;
export type GuestLinkCreateParsed = z.output<typeof guestLinkCreateSchema>;

/** POST /api/guest-links/:id/resend: a fresh link (the one before stops working), e-mailed or to copy. */
export const guestLinkResendSchema = z.object({
  by: z.enum(['email', 'copy'], { message: 'Choose to e-mail the link or copy it.' }),
});
export type GuestLinkResend = z.infer<typeof guestLinkResendSchema>;

/** POST /api/guest-links/:id/handled. */
export const guestLinkHandledSchema = z.object({ handled: z.boolean({ message: 'Say whether the walk is handled.' }) });

export const guestLinkListQuerySchema = z.object({
  status: z.enum(GUEST_LINK_STATUSES, { message: `Choose a status (${GUEST_LINK_STATUSES.join(', ')}).` }).optional(),
});

const person = z.object({ id: z.number(), name: z.string() }).nullable();

/** A guest link as staff see it. Never carries the token. */
export const guestLinkSchema = z.object({
  id: z.number(),
  status: z.enum(GUEST_LINK_STATUSES),
  customerName: z.string(),
  customerEmail: z.string().nullable(),
  note: z.string().nullable(),
  tree: z.object({ id: z.number(), versionId: z.number(), version: z.number(), title: z.string() }),
  createdBy: person,
  createdAt: z.string(),
  expiresAt: z.string(),
  lastSentAt: z.string().nullable(),
  sentCount: z.number(),
  openedAt: z.string().nullable(),
  acknowledgedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  handledAt: z.string().nullable(),
  handledBy: person,
  walk: z
    .object({
      id: z.number(),
      status: z.enum(['open', 'finished']),
      outcome: z.string().nullable(),
      stepCount: z.number(),
      causeText: z.string().nullable(),
      lastStepAt: z.string().nullable(),
      finishedAt: z.string().nullable(),
    })
    .nullable(),
  jobId: z.number().nullable(),
});
export type GuestLink = z.infer<typeof guestLinkSchema>;

export const guestLinkListSchema = z.object({ links: z.array(guestLinkSchema) });
export type GuestLinkList = z.infer<typeof guestLinkListSchema>;

/** Answer to creating or resending: the link (to copy) is shown this once; only its hash is kept. */
export const guestLinkIssuedSchema = z.object({ link: guestLinkSchema, url: z.string(), mailed: z.boolean() });
export type GuestLinkIssued = z.infer<typeof guestLinkIssuedSchema>;

/** GET /api/guest-links/:id: the link and, once started, its walk with steps, readings and photos. */
export const guestLinkDetailSchema = z.object({ link: guestLinkSchema, walk: walkDetailSchema.nullable() });
export type GuestLinkDetail = z.infer<typeof guestLinkDetailSchema>;

/** Answer to POST /api/guest-links/:id/job. */
export const guestLinkJobAnswerSchema = z.object({ link: guestLinkSchema, job: jobSchema });
export type GuestLinkJobAnswer = z.infer<typeof guestLinkJobAnswerSchema>;

// ---- The guest's side ----

/** POST /api/guest/open: the token from the link's address. */
export const guestOpenSchema = z.object({
  token: z
    .string({ message: 'The link has no key in it. Open the whole link from the mail.' })
    .regex(/^[A-Za-z0-9_-]{22,100}$/, 'This link is not complete. Open the whole link from the mail, or ask the shop for a new one.'),
});

/** How the shop can be reached: shown on every guest page, and when a link no longer works. */
export const shopContactSchema = z.object({ name: z.string(), phone: z.string().nullable(), email: z.string().nullable() });
export type ShopContact = z.infer<typeof shopContactSchema>;

/** What a guest sees of their link and walk (GET /api/guest/links/:linkId). */
export const guestWalkStateSchema = z.object({
  linkId: z.number(),
  customerName: z.string(),
  shop: shopContactSchema,
  treeTitle: z.string(),
  expiresAt: z.string(),
  /** Set once the guest has acknowledged the safety notice; the walk starts then. */
  acknowledgedAt: z.string().nullable(),
  walk: walkDetailSchema.nullable(),
  limits: z.object({ maxSteps: z.number(), maxPhotos: z.number(), maxPhotoBytes: z.number() }),
});
export type GuestWalkState = z.infer<typeof guestWalkStateSchema>;

/** The refusal body of a link that is expired or revoked: the shop's contact in details. */
export const guestLinkClosedSchema = z.object({
  error: z.object({
    code: z.enum(['link_expired', 'link_revoked']),
    message: z.string(),
    details: z.object({ shop: shopContactSchema }),
  }),
});
export type GuestLinkClosed = z.infer<typeof guestLinkClosedSchema>;
