import type { Knex } from 'knex';
import type { Config } from '../config';
import { createHealthService } from './health-service';
import { createAuthService } from './auth-service';
import { createShopService } from './shop-service';
import { createAccountBundle } from './account-bundle';
import { createReadingsService } from './readings-service';
import { createJobService } from './job-service';
import { createWalkBundle } from './walk-bundle';
import { createGuestBundle } from './guest-bundle';
import { createTreeService } from './tree-service';
import { createTreeAuthoringBundle } from './tree-authoring-bundle';
import { createPatternService } from './pattern-service';

/** Everything the routes call, built once per app. Services never see req/res. */
export function createServices(deps: { knex: Knex; config: Config }) {
  const accounts = createAccountBundle(deps.knex, deps.config);
  const walkBundle = createWalkBundle(deps.knex, deps.config);
  return {
    health: createHealthService(deps.knex),
    auth: createAuthService(deps.knex),
    shop: createShopService(deps.knex),
    ...accounts,
    readings: createReadingsService(),
    jobs: createJobService(deps.knex),
    ...walkBundle,
    ...createGuestBundle(deps.knex, deps.config, { ...accounts, ...walkBundle }),
    trees: createTreeService(deps.knex),
    ...createTreeAuthoringBundle(deps.knex),
    patterns: createPatternService(deps.knex),
  };
}

export type Services = ReturnType<typeof createServices>;
