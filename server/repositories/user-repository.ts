import type { Knex } from 'knex';
import { identityCache, type SessionUserRow } from '../auth/identity-cache';

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
  const recent = identityCache(knex);
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
    async findForSession(id: number): Promise<SessionUserRow | undefined> {
      return knex('users')
        .join('shops', 'shops.id', 'users.shop_id')
        .where('users.id', id)
        .first('users.id', 'users.shop_id', 'users.role', 'users.active', 'users.name', 'users.email', 'shops.name as shop_name');
    },
    /** Everyone of a shop, owners first, then by name. */
    async listInShop(shopId: number): Promise<UserRow[]> {
      return knex<UserRow>('users')
        .where({ shop_id: shopId })
        .orderByRaw("FIELD(role, 'owner', 'lead', 'tech', 'support')")
        .orderBy('name');
    },
    /** Locks and counts a shop's active owners, inside a transaction (last-owner protection). */
    async lockActiveOwners(shopId: number, trx: Knex): Promise<number[]> {
      const rows = await trx('users').where({ shop_id: shopId, role: 'owner', active: true }).forUpdate().select('id');
      return rows.map((r: { id: number }) => r.id);
    },
    async updateInShop(shopId: number, id: number, patch: Partial<Pick<UserRow, 'role' | 'active'>>, trx: Knex = knex): Promise<void> {
      recent.users.forget(id);
      await trx('users').where({ shop_id: shopId, id }).update(patch);
      recent.users.forget(id);
    },
    async setPassword(id: number, passwordHash: string, trx: Knex = knex): Promise<void> {
      await trx('users').where({ id }).update({ password_hash: passwordHash });
    },
    /** Ends every stored session of a person (after a password reset). */
    async endSessions(id: number, trx: Knex = knex): Promise<void> {
      await trx('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [String(id)]).delete();
      // Rare: forgetting every kept session is simpler than finding that person's.
      recent.sessions.clear();
    },
    async markSignedIn(id: number): Promise<void> {
      await knex('users').where({ id }).update({ last_sign_in_at: knex.fn.now(3) });
    },
  };
}
