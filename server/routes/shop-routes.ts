import { ANY_STAFF, OWNERS } from '@/shared/roles';
import { shopSettingsSchema, type ShopAnswer, type ShopSettings } from '@/shared/schemas/shop';
import type { RouteDef } from '../http/route-table';
import { currentUser } from '../auth/current-user';
import type { Services } from '../services';

/** GET /api/shop for every staff member (altitude and unit are defaults elsewhere); PUT for the owner. */
export const shopRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/shop',
    allow: ANY_STAFF,
    handler: async ({ req }): Promise<ShopAnswer> => ({ shop: await s.shop.get(currentUser(req).shopId) }),
  },
  {
    method: 'put',
    path: '/shop',
    allow: OWNERS,
    body: shopSettingsSchema,
    handler: async ({ req, body }): Promise<ShopAnswer> => ({
      shop: await s.shop.update(currentUser(req).shopId, body as ShopSettings),
    }),
  },
];
