import { LINK_SENDERS } from '@/shared/roles';
import { jobInputSchema } from '@/shared/schemas/jobs';
import { guestLinkCreateSchema, guestLinkHandledSchema, guestLinkListQuerySchema, guestLinkResendSchema } from '@/shared/schemas/guest-links';
import type { RouteDef } from '../http/route-table';
import { currentUser } from '../auth/current-user';
import type { Services } from '../services';
import { requestOrigin } from './auth-routes';
import { idParam } from './job-routes';

const linkId = (params: Record<string, string>) => idParam(params.id, 'That guest link');

/** Guest links as staff manage them (support, leads, owners): create and send, list, review, revoke, resend, turn into a job. */
export const guestLinkRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/guest-links',
    allow: LINK_SENDERS,
    query: guestLinkListQuerySchema,
    handler: async ({ req, query }) => ({ links: await s.guestLinks.list(currentUser(req).shopId, query.status) }),
  },
  {
    method: 'post',
    path: '/guest-links',
    allow: LINK_SENDERS,
    body: guestLinkCreateSchema,
    status: 201,
    handler: ({ req, body }) => s.guestLinks.create(currentUser(req), body, requestOrigin(req)),
  },
  {
    method: 'get',
    path: '/guest-links/:id',
    allow: LINK_SENDERS,
    handler: ({ req, params }) => s.guestLinks.detail(currentUser(req).shopId, linkId(params)),
  },
  {
    method: 'post',
    path: '/guest-links/:id/resend',
    allow: LINK_SENDERS,
    body: guestLinkResendSchema,
    handler: ({ req, params, body }) => s.guestLinks.resend(currentUser(req), linkId(params), body.by, requestOrigin(req)),
  },
  {
    method: 'post',
    path: '/guest-links/:id/revoke',
    allow: LINK_SENDERS,
    handler: async ({ req, params }) => ({ link: await s.guestLinks.revoke(currentUser(req), linkId(params)) }),
  },
  {
    method: 'post',
    path: '/guest-links/:id/handled',
    allow: LINK_SENDERS,
    body: guestLinkHandledSchema,
    handler: async ({ req, params, body }) => ({ link: await s.guestLinks.setHandled(currentUser(req), linkId(params), body.handled) }),
  },
  {
    method: 'post',
    path: '/guest-links/:id/job',
    allow: LINK_SENDERS,
    body: jobInputSchema,
    status: 201,
    handler: ({ req, params, body }) => s.guestLinks.toJob(currentUser(req), linkId(params), body),
  },
];
