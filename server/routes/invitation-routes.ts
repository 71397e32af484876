import { OWNERS } from '@/shared/roles';
import {
  acceptInvitationSchema,
  invitationLookupSchema,
  inviteSchema,
  type AcceptInvitation,
  type Invitation,
  type InvitationsAnswer,
  type Invite,
} from '@/shared/schemas/people';
import type { RouteDef } from '../http/route-table';
import { currentUser } from '../auth/current-user';
import { logInAs } from '../auth/start-session';
import type { Services } from '../services';
import { requestOrigin } from './auth-routes';
import { idParam } from './people-routes';

/**
 * Invitations: the owner lists, sends and withdraws them; the invited person
 * looks a link up and accepts it (public; the token travels in the body, so
 * it never lands in request logs).
 */
export const invitationRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/invitations',
    allow: OWNERS,
    handler: async ({ req }): Promise<InvitationsAnswer> => ({ invitations: await s.invitations.listPending(currentUser(req).shopId) }),
  },
  {
    method: 'post',
    path: '/invitations',
    allow: OWNERS,
    body: inviteSchema,
    status: 201,
    handler: async ({ req, body }): Promise<{ invitation: Invitation }> => ({
      invitation: await s.invitations.invite(currentUser(req), body as Invite, requestOrigin(req)),
    }),
  },
  {
    method: 'delete',
    path: '/invitations/:id',
    allow: OWNERS,
    handler: async ({ req, params }) => {
      await s.invitations.revoke(currentUser(req).shopId, idParam(params.id, 'That invitation'));
      return undefined;
    },
  },
  {
    method: 'post',
    path: '/invitations/lookup',
    allow: 'public',
    body: invitationLookupSchema,
    handler: ({ body }) => s.invitations.lookup((body as { token: string }).token),
  },
  {
    method: 'post',
    path: '/invitations/accept',
    allow: 'public',
    body: acceptInvitationSchema,
    handler: async ({ req, body }) => {
      const user = await s.invitations.accept(body as AcceptInvitation);
      return logInAs(req, s.auth, user);
    },
  },
];
