import { ANY_STAFF } from '@/shared/roles';
import { readingsCheckRequestSchema } from '@/shared/schemas/readings';
import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';

/** POST /api/readings/check: judge vacuum or MAP and fuel trims for any signed-in staff member. */
export const readingsRoutes = (s: Services): RouteDef[] => [
  {
    method: 'post',
    path: '/readings/check',
    allow: ANY_STAFF,
    body: readingsCheckRequestSchema,
    handler: ({ body }) => s.readings.check(body),
  },
];
