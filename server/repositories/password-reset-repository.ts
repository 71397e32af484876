import type { Knex } from 'knex';

export interface PasswordResetRow {
  id: number;
  user_id: number;
  token_hash: string;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

/** Password reset links; found by the token's hash only. */
export function createPasswordResetRepository(knex: Knex) {
  return {
    async create(row: Pick<PasswordResetRow, 'user_id' | 'token_hash' | 'expires_at'>): Promise<number> {
      const [id] = await knex('password_resets').insert(row);
      return id as number;
    },
    /** The reset behind a link, with the person and their shop's name. */
    async findByTokenHash(tokenHash: string, trx: Knex = knex) {
      return trx('password_resets as r')
        .join('users as u', 'u.id', 'r.user_id')
        .join('shops as s', 's.id', 'u.shop_id')
        .where('r.token_hash', tokenHash)
        .first<(PasswordResetRow & { email: string; name: string; active: number | boolean; shop_id: number; role: string; shop_name: string }) | undefined>(
          'r.*',
          'u.email',
          'u.name',
          'u.active',
          'u.shop_id',
          'u.role',
          's.name as shop_name',
        );
    },
    /** Marks every open link of the person used (after a reset, older links die too); false when this one was already used. */
    async useAllFor(userId: number, id: number, now: Date, trx: Knex = knex): Promise<boolean> {
      const n = await trx('password_resets').where({ id }).whereNull('used_at').update({ used_at: now });
      if (n !== 1) return false;
      await trx('password_resets').where({ user_id: userId }).whereNull('used_at').update({ used_at: now });
      return true;
    },
  };
}
