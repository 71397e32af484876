import type { Knex } from 'knex';

export interface WalkRow {
  id: number;
  shop_id: number;
  job_id: number | null;
  tree_id: number;
  tree_version_id: number;
  altitude_m: number;
  baro_kpa: number | null;
  started_by: number | null;
  status: 'open' | 'finished';
  current_step: string;
  step_count: number;
  outcome: 'fixed' | 'not_fixed' | 'referred' | null;
  cause_step: string | null;
  cause_code: string | null;
  cause_text: string | null;
  finish_note: string | null;
  finished_by: number | null;
  time_spent_s: number | null;
  started_at: Date;
  last_step_at: Date | null;
  finished_at: Date | null;
  started_by_name?: string | null;
  finished_by_name?: string | null;
}

export interface WalkStepRow {
  id: string;
  walk_id: number;
  shop_id: number;
  seq: number;
  kind: 'event' | 'undo';
  event: unknown;
  undoes_step_id: string | null;
  from_step: string;
  to_step: string;
  verdict: string | null;
  reading_value: number | null;
  reading_unit: string | null;
  judgement: unknown;
  note: string | null;
  user_id: number | null;
  user_name?: string | null;
  created_at: Date;
}

export interface WalkPhotoRow {
  photo_id: string;
  walk_id: number;
  step_id: string;
  at_seq: number;
  caption: string | null;
  created_at: Date;
  width: number;
  height: number;
}

// mysql2 ≥ 3.23 returns MariaDB JSON columns parsed, older drivers give strings.
const parseJson = (v: unknown) => (typeof v === 'string' ? JSON.parse(v) : v);

/** The walk row, locked until its transaction ends, so steps of one walk are written one at a time. */
export const walkLockQuery = (db: Knex, shopId: number, id: number) => db<WalkRow>('walks').where({ shop_id: shopId, id }).forUpdate().first();

/** A walk's step records in order, each with the name of who recorded it (rows still to go through toStepRow). */
export const stepRowsQuery = (db: Knex, walkId: number) =>
  db('walk_steps').leftJoin('users', 'users.id', 'walk_steps.user_id').where('walk_steps.walk_id', walkId).orderBy('walk_steps.seq').select('walk_steps.*', 'users.name as user_name');

export const toStepRow = (r: WalkStepRow): WalkStepRow => ({ ...r, event: parseJson(r.event) as WalkStepRow['event'], judgement: parseJson(r.judgement) });

export const insertStepQuery = (db: Knex, row: Omit<WalkStepRow, 'user_name'>) =>
  db('walk_steps').insert({
    ...row,
    event: row.event === null ? null : JSON.stringify(row.event),
    judgement: row.judgement === null || row.judgement === undefined ? null : JSON.stringify(row.judgement),
  });

export type WalkPatch = { [K in keyof WalkRow]?: WalkRow[K] | Knex.Raw };
export const walkUpdateQuery = (db: Knex, shopId: number, id: number, patch: WalkPatch) => db('walks').where({ shop_id: shopId, id }).update(patch);

/** Walks, their append-only step records and photo links; every query is scoped by shop. */
export function createWalkRepository(knex: Knex) {
  const walkQuery = (db: Knex, shopId: number) =>
    db('walks')
      .leftJoin('users as s', 's.id', 'walks.started_by')
      .leftJoin('users as f', 'f.id', 'walks.finished_by')
      .where('walks.shop_id', shopId)
      .select('walks.*', 's.name as started_by_name', 'f.name as finished_by_name');

  return {
    async insert(row: Omit<WalkRow, 'id' | 'started_at' | 'last_step_at' | 'finished_at' | 'step_count' | 'status' | 'outcome' | 'cause_step' | 'cause_code' | 'cause_text' | 'finish_note' | 'finished_by' | 'time_spent_s'>): Promise<number> {
      const [id] = await knex('walks').insert(row);
      return id as number;
    },

    async find(shopId: number, id: number, db: Knex = knex): Promise<WalkRow | undefined> {
      return walkQuery(db, shopId).andWhere('walks.id', id).first();
    },

    /** Locks the walk row until the transaction ends, so steps of one walk are written one at a time. */
    async lock(trx: Knex.Transaction, shopId: number, id: number): Promise<WalkRow | undefined> {
      return walkLockQuery(trx, shopId, id);
    },

    async listForJob(shopId: number, jobId: number): Promise<WalkRow[]> {
      return walkQuery(knex, shopId).andWhere('walks.job_id', jobId).orderBy('walks.started_at', 'desc').orderBy('walks.id', 'desc');
    },

    async update(trx: Knex, shopId: number, id: number, patch: WalkPatch): Promise<void> {
      await walkUpdateQuery(trx, shopId, id, patch);
    },

    async steps(walkId: number, db: Knex = knex): Promise<WalkStepRow[]> {
      const rows: WalkStepRow[] = await stepRowsQuery(db, walkId);
      return rows.map(toStepRow);
    },

    /** How many step records (answers and undos) a walk has. */
    async recordCount(db: Knex, walkId: number): Promise<number> {
      const [{ n }] = await db('walk_steps').where({ walk_id: walkId }).count<{ n: number }[]>({ n: '*' });
      return Number(n);
    },

    /** How many photos a walk has. */
    async photoCount(db: Knex, walkId: number): Promise<number> {
      const [{ n }] = await db('walk_photos').where({ walk_id: walkId }).count<{ n: number }[]>({ n: '*' });
      return Number(n);
    },

    async photos(walkId: number): Promise<WalkPhotoRow[]> {
      return knex('walk_photos')
        .join('photos', 'photos.id', 'walk_photos.photo_id')
        .where('walk_photos.walk_id', walkId)
        .orderBy('walk_photos.at_seq')
        .orderBy('walk_photos.created_at')
        .select('walk_photos.*', 'photos.width', 'photos.height');
    },

    async linkPhoto(trx: Knex, row: Omit<WalkPhotoRow, 'created_at' | 'width' | 'height'> & { shop_id: number }): Promise<void> {
      await trx('walk_photos').insert(row);
    },

    async findPhotoLink(shopId: number, walkId: number, photoId: string): Promise<WalkPhotoRow | undefined> {
      return knex('walk_photos').where({ shop_id: shopId, walk_id: walkId, photo_id: photoId }).first();
    },

    /** The shop's name, units and altitude (walks are judged at the shop's altitude). */
    async shop(shopId: number): Promise<{ name: string; altitude_m: number; pressure_unit: string } | undefined> {
      return knex('shops').where({ id: shopId }).first('name', 'altitude_m', 'pressure_unit');
    },
  };
}

export type WalkRepository = ReturnType<typeof createWalkRepository>;
