import type { Knex } from 'knex';

export interface GuestLinkRow {
  id: number;
  shop_id: number;
  tree_id: number;
  tree_version_id: number;
  customer_name: string;
  customer_email: string | null;
  note: string | null;
  token_hash: string;
  expires_at: Date;
  created_by: number | null;
  created_at: Date;
  last_sent_at: Date | null;
  sent_count: number;
  opened_at: Date | null;
  acknowledged_at: Date | null;
  walk_id: number | null;
  revoked_at: Date | null;
  revoked_by: number | null;
  handled_at: Date | null;
  handled_by: number | null;
  job_id: number | null;
}

/** A link with the names and walk facts the lists show. */
export interface GuestLinkRecord extends GuestLinkRow {
  created_by_name: string | null;
  handled_by_name: string | null;
  tree_version: number;
  tree_title: string;
  walk_status: 'open' | 'finished' | null;
  walk_outcome: string | null;
  walk_step_count: number | null;
  walk_cause_text: string | null;
  walk_last_step_at: Date | null;
  walk_finished_at: Date | null;
}

/** A link found by its token hash, with the shop's contact for the guest pages. */
export interface GuestLinkWithShop extends GuestLinkRow {
  shop_name: string;
  contact_phone: string | null;
  contact_email: string | null;
}

export type GuestLinkPatch = Partial<
  Pick<GuestLinkRow, 'token_hash' | 'last_sent_at' | 'sent_count' | 'opened_at' | 'acknowledged_at' | 'walk_id' | 'revoked_at' | 'revoked_by' | 'handled_at' | 'handled_by' | 'job_id'>
>;

/** Guest links; staff queries are scoped by shop, guest look-ups go by token hash or a verified link id. */
export function createGuestLinkRepository(knex: Knex) {
  const records = (db: Knex, shopId: number) =>
    db('guest_links as g')
      .join('tree_versions as v', 'v.id', 'g.tree_version_id')
      .join('trees as t', 't.id', 'g.tree_id')
      .leftJoin('users as c', 'c.id', 'g.created_by')
      .leftJoin('users as h', 'h.id', 'g.handled_by')
      .leftJoin('walks as w', 'w.id', 'g.walk_id')
      .where('g.shop_id', shopId)
      .select(
        'g.*',
        'c.name as created_by_name',
        'h.name as handled_by_name',
        'v.version as tree_version',
        't.title as tree_title',
        'w.status as walk_status',
        'w.outcome as walk_outcome',
        'w.step_count as walk_step_count',
        'w.cause_text as walk_cause_text',
        'w.last_step_at as walk_last_step_at',
        'w.finished_at as walk_finished_at',
      );

  return {
    async create(row: Pick<GuestLinkRow, 'shop_id' | 'tree_id' | 'tree_version_id' | 'customer_name' | 'customer_email' | 'note' | 'token_hash' | 'expires_at' | 'created_by'>): Promise<number> {
      const [id] = await knex('guest_links').insert(row);
      return id as number;
    },

    async find(shopId: number, id: number, db: Knex = knex): Promise<GuestLinkRecord | undefined> {
      return records(db, shopId).andWhere('g.id', id).first();
    },

    /** The shop's links: walks waiting for review first (started, not handled), then newest. */
    async list(shopId: number): Promise<GuestLinkRecord[]> {
      return records(knex, shopId)
        .orderByRaw('(g.walk_id IS NOT NULL AND g.handled_at IS NULL) DESC')
        .orderBy('g.created_at', 'desc')
        .orderBy('g.id', 'desc')
        .limit(500);
    },

    async findByTokenHash(hash: string): Promise<GuestLinkWithShop | undefined> {
      return knex('guest_links as g')
        .join('shops as s', 's.id', 'g.shop_id')
        .where('g.token_hash', hash)
        .first('g.*', 's.name as shop_name', 's.contact_phone', 's.contact_email');
    },

    /** A link by id for a guest whose signed cookie names it (the signature is checked before this runs). */
    async findForGuest(id: number, db: Knex = knex): Promise<GuestLinkWithShop | undefined> {
      return db('guest_links as g').join('shops as s', 's.id', 'g.shop_id').where('g.id', id).first('g.*', 's.name as shop_name', 's.contact_phone', 's.contact_email');
    },

    /** Locks the link row until the transaction ends (starting its walk, turning it into a job). */
    async lock(trx: Knex.Transaction, shopId: number, id: number): Promise<GuestLinkRow | undefined> {
      return trx<GuestLinkRow>('guest_links').where({ shop_id: shopId, id }).forUpdate().first();
    },

    async update(shopId: number, id: number, patch: GuestLinkPatch | Record<string, unknown>, db: Knex = knex): Promise<number> {
      return db('guest_links').where({ shop_id: shopId, id }).update(patch);
    },

    /** Marks the first opening only; later openings leave the time alone. */
    async markOpened(shopId: number, id: number, at: Date): Promise<void> {
      await knex('guest_links').where({ shop_id: shopId, id }).whereNull('opened_at').update({ opened_at: at });
    },

    /** Links a walk to a job (both in this shop). */
    async setWalkJob(trx: Knex, shopId: number, walkId: number, jobId: number): Promise<void> {
      await trx('walks').where({ shop_id: shopId, id: walkId }).update({ job_id: jobId });
    },

    /** Whether a photo belongs to a walk (guests may only see their own). */
    async walkHasPhoto(shopId: number, walkId: number, photoId: string): Promise<boolean> {
      return !!(await knex('walk_photos').where({ shop_id: shopId, walk_id: walkId, photo_id: photoId }).first('photo_id'));
    },
  };
}

export type GuestLinkRepository = ReturnType<typeof createGuestLinkRepository>;
