import { OWNERS } from '@/shared/roles';
import { personUpdateSchema, type PeopleAnswer, type Person, type PersonUpdate } from '@/shared/schemas/people';
import type { RouteDef } from '../http/route-table';
import { currentUser } from '../auth/current-user';
import { notFound } from '../errors';
import type { Services } from '../services';

/** A numeric path id; anything else is "not found", like an id from another shop. */
export function idParam(value: string | undefined, what: string): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) throw notFound(what);
  return id;
}

/** The owner's view of the shop's people. */
export const peopleRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/people',
    allow: OWNERS,
    handler: async ({ req }): Promise<PeopleAnswer> => ({ people: await s.people.list(currentUser(req).shopId) }),
  },
  {
    method: 'patch',
    path: '/people/:id',
    allow: OWNERS,
    body: personUpdateSchema,
    handler: async ({ req, params, body }): Promise<{ person: Person }> => ({
      person: await s.people.update(currentUser(req).shopId, idParam(params.id, 'That person'), body as PersonUpdate),
    }),
  },
];
