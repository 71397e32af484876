import type { Knex } from 'knex';
import type { Me } from '@/shared/schemas/auth';
import { createUserRepository } from '../repositories/user-repository';
import { notFound } from '../errors';

/** Reads about the signed-in person. Sign-in itself is passport's job (server/auth). */
export function createAuthService(knex: Knex) {
  const users = createUserRepository(knex);
  return {
    async me(userId: number): Promise<Me> {
      const u = await users.findForSession(userId);
      if (!u) throw notFound('Your account');
      return { id: u.id, name: u.name, email: u.email, role: u.role, shop: { id: u.shop_id, name: u.shop_name } };
    },
    recordSignIn: (userId: number) => users.markSignedIn(userId),
  };
}
