import type { Knex } from 'knex';
import type { Person, PersonUpdate } from '@/shared/schemas/people';
import { createUserRepository, type UserRow } from '../repositories/user-repository';
import { AppError, notFound } from '../errors';

/** The API shape of a user row (never the password hash). */
export function toPerson(u: UserRow): Person {
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    active: !!u.active,
    lastSignInAt: u.last_sign_in_at ? new Date(u.last_sign_in_at).toISOString() : null,
    createdAt: new Date(u.created_at).toISOString(),
  };
}

const lastOwner = (name: string) =>
  new AppError(
    409,
    'last_owner',
    `${name} is the shop's only active owner, so that change would leave nobody able to manage the shop. Make someone else an owner first.`,
  );

/** The owner's People screen: list, change role, deactivate and reactivate. Always inside the caller's shop. */
export function createPeopleService(knex: Knex) {
  const users = createUserRepository(knex);
  return {
    async list(shopId: number): Promise<Person[]> {
      return (await users.listInShop(shopId)).map(toPerson);
    },

    /**
     * Changes a role or the active flag. The shop's active owners are locked
     * for the transaction, so two owners demoting each other at the same
     * moment cannot both succeed and leave the shop without one.
     */
    async update(shopId: number, id: number, patch: PersonUpdate): Promise<Person> {
      await knex.transaction(async (trx) => {
        const owners = await users.lockActiveOwners(shopId, trx);
        const target = await trx<UserRow>('users').where({ shop_id: shopId, id }).first();
        if (!target) throw notFound('That person');
        const losesOwner = owners.includes(id) && ((patch.role !== undefined && patch.role !== 'owner') || patch.active === false);
        if (losesOwner && owners.length <= 1) throw lastOwner(target.name);
        const change: Partial<Pick<UserRow, 'role' | 'active'>> = {};
        if (patch.role !== undefined) change.role = patch.role;
        if (patch.active !== undefined) change.active = patch.active;
        await users.updateInShop(shopId, id, change, trx);
      });
      const updated = await users.findInShop(shopId, id);
      if (!updated) throw notFound('That person');
      return toPerson(updated);
    },
  };
}
