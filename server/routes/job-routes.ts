import { z } from 'zod';
import { WORKSHOP } from '@/shared/roles';
import { jobInputSchema, jobListQuerySchema } from '@/shared/schemas/jobs';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';
import { notFound } from '../errors';

/** A numeric id from the path; anything else is a 404, never a 500. */
export function idParam(raw: string | undefined, what: string): number {
  const id = z.coerce.number().int().positive().max(2 ** 31).safeParse(raw);
  if (!id.success) throw notFound(what);
  return id.data;
}

const me = (req: { user?: unknown }) => req.user as SessionUser;

/** Jobs: list and search, create, read, edit. */
export const jobRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/jobs',
    allow: WORKSHOP,
    query: jobListQuerySchema,
    handler: async ({ req, query }) => s.jobs.list(me(req).shopId, query),
  },
  {
    method: 'post',
    path: '/jobs',
    allow: WORKSHOP,
    body: jobInputSchema,
    status: 201,
    handler: async ({ req, body }) => ({ job: await s.jobs.create(me(req).shopId, me(req).id, body) }),
  },
  {
    method: 'get',
    path: '/jobs/:id',
    allow: WORKSHOP,
    handler: async ({ req, params }) => ({ job: await s.jobs.get(me(req).shopId, idParam(params.id, 'That job')) }),
  },
  {
    method: 'put',
    path: '/jobs/:id',
    allow: WORKSHOP,
    body: jobInputSchema,
    handler: async ({ req, params, body }) => ({ job: await s.jobs.update(me(req).shopId, idParam(params.id, 'That job'), body) }),
  },
];
