import { ANY_STAFF } from '@/shared/roles';
import type { RouteDef } from '../http/route-table';
import type { SessionUser } from '../http/access';
import type { Services } from '../services';

/** Serving photos: only to signed-in people of the shop that owns them. */
export const photoRoutes = (s: Services): RouteDef[] =>
  (['full', 'thumb'] as const).map((variant) => ({
    method: 'get' as const,
    path: variant === 'full' ? '/photos/:id' : '/photos/:id/thumb',
    allow: ANY_STAFF,
    handler: async ({ req, res, params }) => {
      const photo = await s.photos.read((req.user as SessionUser).shopId, params.id, variant);
      res.set({
        'Content-Type': photo.contentType,
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': `inline; filename="photo-${photo.id}${variant === 'thumb' ? '-thumb' : ''}.${photo.contentType.split('/')[1].replace('jpeg', 'jpg')}"`,
        // An id always names the same bytes, but only this person may keep a copy.
        'Cache-Control': 'private, max-age=86400, immutable',
        'Content-Security-Policy': "default-src 'none'; sandbox",
      });
      res.status(200).send(photo.data);
      return undefined;
    },
  }));
