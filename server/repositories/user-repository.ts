import type { Knex } from 'knex';

import type { Role } from '@/shared/roles';
export type { Role };

export interface UserRow {
  id: number;
  shop_id: number;
  email: string;
  name: string;
  password_hash: string;
  role: Role;
  active: number | boolean;
  last_sign_in_at: Date | null;
  created_at: Date;
}

/** Users table access; every read that serves a request is scoped by shop. */
export function createUserRepository(knex: Knex) {
  return {
    async create(user: Pick<UserRow, 'shop_id' | 'email' | 'name' | 'password_hash' | 'role'>, trx: Knex = knex): Promise<number> {
      const [id] = await trx('users').insert({ ...user, email: user.email.toLowerCase() });
      return id as number;
    },
    async findByEmail(email: string): Promise<UserRow | undefined> {
      return knex<UserRow>('users').where({ email: email.toLowerCase() }).first();
    },
    async findInShop(shopId: number, id: number): Promise<UserRow | undefined> {
      return knex<UserRow>('users').where({ shop_id: shopId, id }).first();
    },
    /** Loads the person behind a session with their shop's name, or undefined. */
    async findForSession(id: number): Promise<(UserRow & { shop_name: string }) | undefined> {
      return knex('users')
        .join('shops', 'shops.id', 'users.shop_id')
        .where('users.id', id)
        .first('users.*', 'shops.name as shop_name');
    },
    async markSignedIn(id: number): Promise<void> {
      await knex('users').where({ id }).update({ last_sign_in_at: knex.fn.now(3) });
    },
  };
}
