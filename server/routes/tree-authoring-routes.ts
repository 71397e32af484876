import { ANY_STAFF, AUTHORS } from '@/shared/roles';
import {
  diffQuerySchema,
  discardQuerySchema,
  draftSaveSchema,
  exportQuerySchema,
  publishSchema,
  statsQuerySchema,
  treeCreateSchema,
  treeImportSchema,
} from '@/shared/schemas/tree-authoring';
import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';
import { currentUser } from '../auth/current-user';
import { idParam } from './job-routes';

const treeId = (params: Record<string, string>) => idParam(params.id, 'That tree');
const author = (req: Parameters<typeof currentUser>[0]) => {
  const u = currentUser(req);
  return { id: u.id, shopId: u.shopId };
};

/**
 * Tree authoring: leads and owners create trees, edit the one draft of a
 * tree (saves carry the revision they were based on), publish, retire and
 * import; every staff member may read history, differences, statistics and
 * export a published tree.
 */
export const treeAuthoringRoutes = (s: Services): RouteDef[] => [
  {
    method: 'post',
    path: '/trees',
    allow: AUTHORS,
    body: treeCreateSchema,
    status: 201,
    handler: async ({ req, body }) => s.treeAuthoring.create(author(req), body),
  },
  {
    method: 'post',
    path: '/trees/import',
    allow: AUTHORS,
    body: treeImportSchema,
    status: 201,
    handler: async ({ req, body }) => s.treeFiles.importFile(author(req), body),
  },
  {
    method: 'get',
    path: '/retired-trees',
    allow: AUTHORS,
    handler: async ({ req }) => s.treeFiles.retired(currentUser(req).shopId),
  },
  {
    method: 'get',
    path: '/trees/:id/draft',
    allow: AUTHORS,
    handler: async ({ req, params }) => s.treeAuthoring.draft(currentUser(req).shopId, treeId(params)),
  },
  {
    method: 'post',
    path: '/trees/:id/draft',
    allow: AUTHORS,
    status: 201,
    handler: async ({ req, params }) => s.treeAuthoring.startDraft(author(req), treeId(params)),
  },
  {
    method: 'put',
    path: '/trees/:id/draft',
    allow: AUTHORS,
    body: draftSaveSchema,
    handler: async ({ req, params, body }) => s.treeAuthoring.save(author(req), treeId(params), body),
  },
  {
    method: 'delete',
    path: '/trees/:id/draft',
    allow: AUTHORS,
    query: discardQuerySchema,
    handler: async ({ req, params, query }) => {
      await s.treeAuthoring.discard(author(req), treeId(params), query.revision);
      return undefined;
    },
  },
  {
    method: 'post',
    path: '/trees/:id/publish',
    allow: AUTHORS,
    body: publishSchema,
    handler: async ({ req, params, body }) => s.treeAuthoring.publish(author(req), treeId(params), body),
  },
  {
    method: 'post',
    path: '/trees/:id/retire',
    allow: AUTHORS,
    handler: async ({ req, params }) => s.treeAuthoring.setStatus(author(req), treeId(params), 'retired'),
  },
  {
    method: 'post',
    path: '/trees/:id/restore',
    allow: AUTHORS,
    handler: async ({ req, params }) => s.treeAuthoring.setStatus(author(req), treeId(params), 'active'),
  },
  {
    method: 'get',
    path: '/trees/:id/history',
    allow: ANY_STAFF,
    handler: async ({ req, params }) => s.treeFiles.history(currentUser(req).shopId, treeId(params)),
  },
  {
    method: 'get',
    path: '/trees/:id/versions/:versionId',
    allow: ANY_STAFF,
    handler: async ({ req, params }) => s.treeFiles.versionDoc(currentUser(req).shopId, treeId(params), idParam(params.versionId, 'That version')),
  },
  {
    method: 'get',
    path: '/trees/:id/diff',
    allow: ANY_STAFF,
    query: diffQuerySchema,
    handler: async ({ req, params, query }) => s.treeFiles.diff(currentUser(req).shopId, treeId(params), query.from, query.to),
  },
  {
    method: 'get',
    path: '/trees/:id/stats',
    allow: ANY_STAFF,
    query: statsQuerySchema,
    handler: async ({ req, params, query }) => s.treeStats.forTree(currentUser(req).shopId, treeId(params), query.version),
  },
  {
    method: 'get',
    path: '/trees/:id/export',
    allow: ANY_STAFF,
    query: exportQuerySchema,
    handler: async ({ req, res, params, query }) => {
      const file = await s.treeFiles.exportFile(currentUser(req).shopId, treeId(params), query.version);
      res.set({
        'Content-Type': 'application/json; charset=utf-8',
        'Content-Disposition': `attachment; filename="${file.filename}"`,
        'Cache-Control': 'private, no-store',
      });
      res.status(200).send(`${JSON.stringify(file.doc, null, 2)}\n`);
      return undefined;
    },
  },
];
