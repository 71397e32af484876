import type { Knex } from 'knex';
import { identityCache } from '../auth/identity-cache';

export interface ShopRow {
  id: number;
  name: string;
  altitude_m: number;
  pressure_unit: string;
  comeback_window_days: number;
  contact_phone: string | null;
  contact_email: string | null;
  created_at: Date;
}

/** Shops table access. */
export function createShopRepository(knex: Knex) {
  return {
    async create(shop: Pick<ShopRow, 'name'> & Partial<Omit<ShopRow, 'id' | 'created_at'>>, trx: Knex = knex): Promise<number> {
      const [id] = await trx('shops').insert(shop);
      return id as number;
    },
    async findById(id: number): Promise<ShopRow | undefined> {
      return knex<ShopRow>('shops').where({ id }).first();
    },
    async update(id: number, patch: Partial<Pick<ShopRow, 'name' | 'altitude_m' | 'pressure_unit' | 'comeback_window_days'>>): Promise<void> {
      await knex('shops').where({ id }).update(patch);
      // The shop's name travels with each signed-in person (identity-cache.ts).
      identityCache(knex).users.clear();
    },
    async count(): Promise<number> {
      const row = await knex('shops').count<{ n: number }[]>({ n: '*' }).first();
      return Number(row?.n ?? 0);
    },
  };
}
