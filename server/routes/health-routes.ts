import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';

/** GET /api/health: 200 when all is well, 503 with the reason when the database is down. */
export const healthRoutes = (s: Services): RouteDef[] => [
  {
    method: 'get',
    path: '/health',
    allow: 'public',
    handler: async ({ res }) => {
      const health = await s.health.check();
      res.status(health.status === 'ok' ? 200 : 503).json(health);
      return undefined;
    },
  },
];
