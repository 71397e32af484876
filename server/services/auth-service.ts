import type { Knex } from 'knex';
import type { Me, SignUp } from '@/shared/schemas/auth';
import type { SessionUser } from '../http/access';
import { createUserRepository } from '../repositories/user-repository';
import { createShopRepository } from '../repositories/shop-repository';
import { hashPassword } from '../auth/passwords';
import { conflict, notFound } from '../errors';
import { installStockTrees } from './tree-stock';

export const EMAIL_TAKEN = 'That address already has a Baywalk account. Sign in instead, or use another address.';

/** Reads about the signed-in person and opens new shops. Sign-in itself is passport's job (server/auth). */
export function createAuthService(knex: Knex) {
  const users = createUserRepository(knex);
  const shops = createShopRepository(knex);
  return {
    async me(userId: number): Promise<Me> {
      const u = await users.findForSession(userId);
      if (!u) throw notFound('Your account');
      return { id: u.id, name: u.name, email: u.email, role: u.role, shop: { id: u.shop_id, name: u.shop_name } };
    },
    recordSignIn: (userId: number) => users.markSignedIn(userId),

    /** Creates a shop and its first owner in one transaction; answers the new owner. */
    async signUp(input: SignUp): Promise<SessionUser> {
      if (await users.findByEmail(input.email)) throw conflict(EMAIL_TAKEN, { fields: { email: EMAIL_TAKEN } });
      const passwordHash = await hashPassword(input.password);
      try {
        return await knex.transaction(async (trx) => {
          const shopId = await shops.create({ name: input.shopName }, trx);
          const id = await users.create({ shop_id: shopId, email: input.email, name: input.name, role: 'owner', password_hash: passwordHash }, trx);
          // A new shop opens with the stock tree library, in the same transaction (all or nothing).
          await installStockTrees(trx, shopId);
          return { id, shopId, role: 'owner' };
        });
      } catch (err) {
        // Two sign-ups with one address at the same moment: the unique index decides.
        if ((err as { errno?: number }).errno === 1062) throw conflict(EMAIL_TAKEN, { fields: { email: EMAIL_TAKEN } });
        throw err;
      }
    },
  };
}
