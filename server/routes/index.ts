import type { RouteDef } from '../http/route-table';
import type { Services } from '../services';
import type { PassportStatic } from 'passport';
import { healthRoutes } from './health-routes';
import { authRoutes } from './auth-routes';
import { shopRoutes } from './shop-routes';
import { peopleRoutes } from './people-routes';
import { invitationRoutes } from './invitation-routes';
import { readingsRoutes } from './readings-routes';
import { jobRoutes } from './job-routes';
import { walkRoutes } from './walk-routes';
import { photoRoutes } from './photo-routes';
import { guestLinkRoutes } from './guest-link-routes';
import { guestWalkRoutes } from './guest-walk-routes';
import { treeRoutes } from './tree-routes';
import { treeAuthoringRoutes } from './tree-authoring-routes';
import { patternRoutes } from './pattern-routes';

/** The whole API route table, paths relative to /api. Tests walk this list. */
export function apiRoutes(s: Services, passport: PassportStatic): RouteDef[] {
  return [...healthRoutes(s), ...authRoutes(s, passport), ...shopRoutes(s), ...peopleRoutes(s), ...invitationRoutes(s), ...readingsRoutes(s), ...jobRoutes(s), ...walkRoutes(s), ...photoRoutes(s), ...guestLinkRoutes(s), ...guestWalkRoutes(s), ...treeRoutes(s), ...treeAuthoringRoutes(s), ...patternRoutes(s)];
}
