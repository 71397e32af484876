import type { Knex } from 'knex';

export interface PhotoRow {
  id: string;
  shop_id: number;
  uploaded_by: number | null;
  content_type: string;
  width: number;
  height: number;
  bytes: number;
  storage_key: string;
  thumb_key: string;
  created_at: Date;
}

/** Photo records (the bytes live in the photo store); every query is scoped by shop. */
export function createPhotoRepository(knex: Knex) {
  return {
    async insert(row: Omit<PhotoRow, 'created_at'>, trx: Knex = knex): Promise<void> {
      await trx('photos').insert(row);
    },
    async findInShop(shopId: number, id: string): Promise<PhotoRow | undefined> {
      return knex<PhotoRow>('photos').where({ shop_id: shopId, id }).first();
    },
    async remove(shopId: number, id: string, trx: Knex = knex): Promise<void> {
      await trx('photos').where({ shop_id: shopId, id }).delete();
    },
  };
}
