import crypto from 'node:crypto';
import type { Knex } from 'knex';
import type { PhotoStore } from '../photos';
import { EXTENSION, preparePhoto } from '../photos/image-pipeline';
import { createPhotoRepository, type PhotoRow } from '../repositories/photo-repository';
import { notFound } from '../errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/**
 * Photos: checked and re-encoded in memory, written to the store, then
 * recorded in the database together with whatever links them (a walk step)
 * in one transaction. If anything after the write fails, the files are
 * removed again, so a refused upload leaves nothing behind.
 */
export function createPhotoService(knex: Knex, store: PhotoStore) {
  const photos = createPhotoRepository(knex);

  return {
    /** Stores an uploaded photo; `link` runs inside the same transaction as the photo row. */
    async save(
      shopId: number,
      userId: number | null,
      bytes: Buffer,
      link: (trx: Knex.Transaction, photoId: string) => Promise<void>,
    ): Promise<PhotoRow> {
      const { photo, thumb } = await preparePhoto(bytes);
      const id = crypto.randomUUID();
      const row = {
        id,
        shop_id: shopId,
        uploaded_by: userId,
        content_type: photo.contentType,
        width: photo.width,
        height: photo.height,
        bytes: photo.data.length,
        storage_key: `${shopId}/${id}.${EXTENSION[photo.contentType]}`,
        thumb_key: `${shopId}/${id}-thumb.jpg`,
      };
      try {
        await store.put(row.storage_key, photo.data, photo.contentType);
        await store.put(row.thumb_key, thumb.data, thumb.contentType);
        await knex.transaction(async (trx) => {
          await photos.insert(row, trx);
          await link(trx, id);
        });
      } catch (err) {
        await Promise.allSettled([store.remove(row.storage_key), store.remove(row.thumb_key)]);
        throw err;
      }
      return { ...row, created_at: new Date() };
    },

    /** The bytes of a photo or its thumbnail, only inside the shop that owns it. */
    async read(shopId: number, id: string, variant: 'full' | 'thumb'): Promise<{ data: Buffer; contentType: string; id: string }> {
      if (!UUID.test(id)) throw notFound('That photo');
      const row = await photos.findInShop(shopId, id);
      if (!row) throw notFound('That photo');
      const data = await store.get(variant === 'thumb' ? row.thumb_key : row.storage_key);
      if (!data) throw notFound('That photo file');
      return { data, contentType: variant === 'thumb' ? 'image/jpeg' : row.content_type, id };
    },

    /** Deletes a photo's row (its links go by cascade) and then its files. */
    async remove(shopId: number, id: string): Promise<void> {
      const row = await photos.findInShop(shopId, id);
      if (!row) throw notFound('That photo');
      await photos.remove(shopId, id);
      await Promise.allSettled([store.remove(row.storage_key), store.remove(row.thumb_key)]);
    },
  };
}

export type PhotoService = ReturnType<typeof createPhotoService>;
