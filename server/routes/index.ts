import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';
import { healthRoutes } from './health-routes';

/** The whole API route table, paths relative to /api. Tests walk this list. */
export function apiRoutes(s: Services): RouteDef[] {
  return [...healthRoutes(s)];
}
