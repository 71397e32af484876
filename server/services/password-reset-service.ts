import type { Knex } from 'knex';
import type { ResetCheckAnswer, ResetPassword } from '@/shared/schemas/auth';
import type { Role } from '@/shared/roles';
import type { SessionUser } from '../http/access';
import { createPasswordResetRepository } from '../repositories/password-reset-repository';
import { createUserRepository } from '../repositories/user-repository';
import { createShopRepository } from '../repositories/shop-repository';
import { hashLinkToken, linkTo, newLinkToken } from '../auth/link-tokens';
import { hashPassword } from '../auth/passwords';
import type { Mailer } from '../mail/mailer';
import { passwordResetMail } from '../mail/templates';
import { linkErrors } from './link-errors';

export const RESET_MINUTES = 60;

/** Password reset by e-mail: single-use links valid for one hour, stored hashed. */
export function createPasswordResetService(
  knex: Knex,
  deps: { mailer: Mailer; linkOrigin: (requestOrigin: string) => string; onMailError: (err: unknown) => void },
) {
  const resets = createPasswordResetRepository(knex);
  const users = createUserRepository(knex);
  const shops = createShopRepository(knex);

  async function usable(token: string, trx: Knex = knex) {
    const row = await resets.findByTokenHash(hashLinkToken(token), trx);
    if (!row || !row.active) throw linkErrors.invalid('reset');
    if (row.used_at) throw linkErrors.used('reset');
    if (new Date(row.expires_at).getTime() <= Date.now()) throw linkErrors.expired('reset');
    return row;
  }

  return {
    /**
     * Starts a reset for an active account. The caller answers the same words
     * whatever happens here, and the mail goes out after the answer, so
     * neither the words nor the timing tell whether the address exists.
     */
    async request(email: string, requestOrigin: string): Promise<void> {
      const user = await users.findByEmail(email);
      if (!user || !user.active) return;
      const shop = await shops.findById(user.shop_id);
      const { token, hash } = newLinkToken();
      await resets.create({ user_id: user.id, token_hash: hash, expires_at: new Date(Date.now() + RESET_MINUTES * 60_000) });
      const url = linkTo(deps.linkOrigin(requestOrigin), '/reset-password', token);
      void deps.mailer.send(passwordResetMail({ to: user.email, name: user.name, shopName: shop?.name ?? 'Baywalk', url })).catch(deps.onMailError);
    },

    async check(token: string): Promise<ResetCheckAnswer> {
      const row = await usable(token);
      return { email: row.email, shopName: row.shop_name };
    },

    /** Sets the new password, uses up every open link of the person, ends their other sessions. */
    async complete(input: ResetPassword): Promise<SessionUser> {
      const passwordHash = await hashPassword(input.password);
      return knex.transaction(async (trx) => {
        const row = await usable(input.token, trx);
        if (!(await resets.useAllFor(row.user_id, row.id, new Date(), trx))) throw linkErrors.used('reset');
        await users.setPassword(row.user_id, passwordHash, trx);
        await users.endSessions(row.user_id, trx);
        return { id: row.user_id, shopId: row.shop_id, role: row.role as Role };
      });
    },
  };
}
