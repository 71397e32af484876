import type { Knex } from 'knex';
import type { Config } from '../config';
import type { Mailer } from '../mail/mailer';
import { guestBinding } from '../http/guest-access';
import { createGuestLimiters, guestLimits } from '../http/guest-limits';
import type { PhotoService } from './photo-service';
import type { WalkService } from './walk-service';
import { createGuestLinkService } from './guest-link-service';
import { createGuestWalkService } from './guest-walk-service';

/**
 * Guest links: the staff side (create, send, manage, review), the guest's
 * side (open, acknowledge, walk), and the middleware guest routes need
 * (binding check with the server's secret, rate limits counted in MariaDB).
 */
export function createGuestBundle(
  knex: Knex,
  config: Config,
  deps: { mailer: Mailer; linkOrigin: (requestOrigin: string) => string; walks: WalkService; photos: PhotoService },
) {
  return {
    guestLinks: createGuestLinkService(knex, deps),
    guestWalks: createGuestWalkService(knex, deps),
    guestHttp: {
      binding: guestBinding(config.sessionSecret),
      limiters: createGuestLimiters(knex, guestLimits()),
      cookie: { secret: config.sessionSecret, secure: config.secureCookies },
    },
  };
}
