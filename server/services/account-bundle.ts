import type { Knex } from 'knex';
import type { Config } from '../config';
import { createSmtpMailer } from '../mail/mailer';
import { createPeopleService } from './people-service';
import { createInvitationService } from './invitation-service';
import { createPasswordResetService } from './password-reset-service';
import { createAuthLimiters } from '../auth/rate-limits';

/**
 * Account services that send mail, plus the mailer itself for other features
 * (guest links) to reuse. Links in mail use BAYWALK_PUBLIC_URL when set, else
 * the address the request came to (never in production: main.ts requires the setting).
 */
export function createAccountBundle(knex: Knex, config: Config) {
  const mailer = createSmtpMailer(config.smtp);
  const linkOrigin = (requestOrigin: string) => config.publicUrl ?? requestOrigin;
  const onMailError = (err: unknown) => console.error(`baywalk: a mail could not be sent: ${(err as Error).message}`);
  return {
    mailer,
    /** The address e-mailed links start with, for a request that came to `requestOrigin`. */
    linkOrigin,
    people: createPeopleService(knex),
    invitations: createInvitationService(knex, { mailer, linkOrigin }),
    passwordResets: createPasswordResetService(knex, { mailer, linkOrigin, onMailError }),
    /** Rate-limit middleware for the sign-in and reset routes (counted in MariaDB). */
    limiters: createAuthLimiters(knex, config.rateLimits),
  };
}
