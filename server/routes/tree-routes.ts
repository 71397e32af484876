import { ANY_STAFF } from '@/shared/roles';
import { treeListQuerySchema } from '@/shared/schemas/trees';
import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';
import { currentUser } from '../auth/current-user';
import { notFound } from '../errors';

/** A positive integer id from the path; anything else is "not found", never a 500. */
function treeId(raw: string | undefined): number {
  if (!raw || !/^\d{1,10}$/.test(raw)) throw notFound('That tree');
  return Number(raw);
}

/** The shop's tree library: list with filters and search, and one tree with its published version. */
export const treeRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/trees',
    allow: ANY_STAFF,
    query: treeListQuerySchema,
    handler: async ({ req, query }) => s.trees.list(currentUser(req).shopId, query),
  },
  {
    method: 'get',
    path: '/trees/:id',
    allow: ANY_STAFF,
    handler: async ({ req, params }) => s.trees.page(currentUser(req).shopId, treeId(params.id)),
  },
];
