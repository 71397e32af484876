import type { RequestHandler } from 'express';
import { guestOpenSchema } from '@/shared/schemas/guest-links';
import { walkFinishSchema, walkPhotoFieldsSchema, walkStepInputSchema, walkUndoInputSchema } from '@/shared/schemas/walks';
import type { WalkEvent } from '@/trees/engine-types';
import type { RouteDef } from '../http/route-table';
import { GUEST_ONLY, guestOf, setBindingCookie } from '../http/guest-access';
import { guestPhotoUpload } from '../http/guest-upload';
import type { Services } from '../services';

const BASE = '/guest/links/:linkId';

/**
 * The guest's side, for a customer holding a link. Opening the link (public)
 * binds the browser with a cookie scoped to that link's paths; every other
 * guest route needs that binding (GUEST_ONLY: never staff), is rate limited
 * per address and per link, and reaches only that link's walk.
 */
export const guestWalkRoutes = (s: Services): RouteDef[] => {
  const { binding, limiters, cookie } = s.guestHttp;
  const guarded = (...extra: RequestHandler[]) => [limiters.perIp, binding, limiters.perLink, ...extra];
  const id = (req: Parameters<RequestHandler>[0]) => guestOf(req).linkId;
  const photoRoute = (variant: 'full' | 'thumb'): RouteDef => ({
    method: 'get',
    path: variant === 'full' ? `${BASE}/photos/:photoId` : `${BASE}/photos/:photoId/thumb`,
    allow: GUEST_ONLY,
    before: guarded(),
    handler: async ({ req, res, params }) => {
      const photo = await s.guestWalks.readPhoto(id(req), params.photoId, variant);
      res.set({
        'Content-Type': photo.contentType,
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'private, no-store',
        'Content-Security-Policy': "default-src 'none'; sandbox",
      });
      res.status(200).send(photo.data);
      return undefined;
    },
  });

  return [
    {
      method: 'post',
      path: '/guest/open',
      allow: 'public',
      before: limiters.open,
      body: guestOpenSchema,
      handler: async ({ res, body }) => {
        const opened = await s.guestWalks.open(body.token);
        setBindingCookie(res, { secret: cookie.secret, secure: cookie.secure, linkId: opened.linkId, expiresAt: opened.expiresAt });
        return { linkId: opened.linkId };
      },
    },
    { method: 'get', path: BASE, allow: GUEST_ONLY, before: guarded(), handler: ({ req }) => s.guestWalks.state(id(req)) },
    { method: 'post', path: `${BASE}/acknowledge`, allow: GUEST_ONLY, before: guarded(), handler: ({ req }) => s.guestWalks.acknowledge(id(req)) },
    {
      method: 'post',
      path: `${BASE}/steps`,
      allow: GUEST_ONLY,
      before: guarded(),
      body: walkStepInputSchema,
      handler: ({ req, body }) => s.guestWalks.step(id(req), { ...body, event: body.event as WalkEvent }),
    },
    { method: 'post', path: `${BASE}/undo`, allow: GUEST_ONLY, before: guarded(), body: walkUndoInputSchema, handler: ({ req, body }) => s.guestWalks.undo(id(req), body) },
    { method: 'post', path: `${BASE}/finish`, allow: GUEST_ONLY, before: guarded(), body: walkFinishSchema, handler: ({ req, body }) => s.guestWalks.finish(id(req), body) },
    {
      method: 'post',
      path: `${BASE}/photos`,
      allow: GUEST_ONLY,
      before: guarded(limiters.photos, guestPhotoUpload),
      body: walkPhotoFieldsSchema,
      status: 201,
      handler: async ({ req, body }) => ({ photo: await s.guestWalks.addPhoto(id(req), req.file!.buffer, body) }),
    },
    {
      method: 'delete',
      path: `${BASE}/photos/:photoId`,
      allow: GUEST_ONLY,
      before: guarded(),
      handler: async ({ req, params }) => {
        await s.guestWalks.removePhoto(id(req), params.photoId);
        return undefined;
      },
    },
    photoRoute('full'),
    photoRoute('thumb'),
  ];
};
