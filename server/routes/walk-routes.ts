import { WORKSHOP } from '@/shared/roles';
import { walkFinishSchema, walkPhotoFieldsSchema, walkStartSchema, walkStepInputSchema, walkUndoInputSchema } from '@/shared/schemas/walks';
import type { WalkEvent } from '@/trees/engine-types';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';
import { photoUpload } from '../photos/upload';
import { idParam } from './job-routes';

const actor = (req: { user?: unknown }) => {
  const u = req.user as SessionUser;
  return { id: u.id, shopId: u.shopId, name: u.name };
};
const walkId = (params: Record<string, string>) => idParam(params.id, 'That walk');

/** Walks: start on a job, read, answer step by step, undo, photos, finish, report. */
export const walkRoutes = (s: Services): RouteDef[] => [
  {
    method: 'post',
    path: '/walks',
    allow: WORKSHOP,
    body: walkStartSchema,
    status: 201,
    handler: async ({ req, body }) => ({ walk: await s.walks.start(actor(req), body) }),
  },
  {
    method: 'get',
    path: '/jobs/:id/walks',
    allow: WORKSHOP,
    handler: async ({ req, params }) => ({ items: await s.walks.listForJob(actor(req).shopId, idParam(params.id, 'That job')) }),
  },
  {
    method: 'get',
    path: '/walks/:id',
    allow: WORKSHOP,
    handler: async ({ req, params }) => s.walks.get(actor(req).shopId, walkId(params)),
  },
  {
    method: 'post',
    path: '/walks/:id/steps',
    allow: WORKSHOP,
    body: walkStepInputSchema,
    handler: async ({ req, params, body }) => s.walks.step(actor(req), walkId(params), { ...body, event: body.event as WalkEvent }),
  },
  {
    method: 'post',
    path: '/walks/:id/undo',
    allow: WORKSHOP,
    body: walkUndoInputSchema,
    handler: async ({ req, params, body }) => s.walks.undo(actor(req), walkId(params), body),
  },
  {
    method: 'post',
    path: '/walks/:id/finish',
    allow: WORKSHOP,
    body: walkFinishSchema,
    handler: async ({ req, params, body }) => {
      await s.walks.finish(actor(req), walkId(params), body);
      return s.walks.get(actor(req).shopId, walkId(params));
    },
  },
  {
    method: 'post',
    path: '/walks/:id/photos',
    allow: WORKSHOP,
    before: [photoUpload],
    body: walkPhotoFieldsSchema,
    status: 201,
    handler: async ({ req, params, body }) => ({ photo: await s.walks.addPhoto(actor(req), walkId(params), req.file!.buffer, body) }),
  },
  {
    method: 'get',
    path: '/walks/:id/report.pdf',
    allow: WORKSHOP,
    handler: async ({ req, res, params }) => {
      const pdf = await s.reports.walkPdf(actor(req).shopId, walkId(params));
      res.set({
        'Content-Type': 'application/pdf',
        'Content-Disposition': `attachment; filename="${pdf.filename}"`,
        'Cache-Control': 'private, no-store',
        'X-Content-Type-Options': 'nosniff',
      });
      res.status(200).send(pdf.data);
      return undefined;
    },
  },
  {
    method: 'delete',
    path: '/walks/:id/photos/:photoId',
    allow: WORKSHOP,
    handler: async ({ req, params }) => {
      await s.walks.removePhoto(actor(req), walkId(params), params.photoId);
      return undefined;
    },
  },
];
