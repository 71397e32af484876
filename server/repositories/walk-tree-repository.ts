import type { Knex } from 'knex';

/** A published tree version a walk is pinned to; `doc` is the stored document, still to be parsed. */
export interface PinnedTree {
  treeId: number;
  versionId: number;
  version: number;
  title: string;
  symptom: string;
  doc: unknown;
}

const parseJson = (v: unknown) => (typeof v === 'string' ? JSON.parse(v) : v);

type PinnedRow = { version_id: number; tree_id: number; version: number; doc: unknown; title: string; symptom: string };

const pinnedBase = (db: Knex, shopId: number) =>
  db('tree_versions as v')
    .join('trees as t', 't.id', 'v.tree_id')
    .where('t.shop_id', shopId)
    .select('v.id as version_id', 'v.tree_id', 'v.version', 'v.doc', 't.title', 't.symptom');

/** A pinned version of the shop by id, whatever has been published since (a row for toPinned). */
export const pinnedVersionQuery = (db: Knex, shopId: number, versionId: number) => pinnedBase(db, shopId).andWhere('v.id', versionId).andWhere('v.shop_id', shopId).first();

export function toPinned(r: PinnedRow | undefined): PinnedTree | undefined {
  if (!r) return undefined;
  const doc = parseJson(r.doc) as { title?: unknown } | null;
  // The pinned document's own title: the library row may be renamed later.
  const title = typeof doc?.title === 'string' ? doc.title : r.title;
  return { treeId: r.tree_id, versionId: r.version_id, version: r.version, title, symptom: r.symptom, doc };
}

type MetaRow = { version_id: number; tree_id: number; version: number; title: string; symptom: string; doc_title: string | null };

/** Versions of the shop without their documents; the pinned document's own title is read in the database. */
const metaQuery = (db: Knex, shopId: number) =>
  db('tree_versions as v')
    .join('trees as t', 't.id', 'v.tree_id')
    .where('t.shop_id', shopId)
    .andWhere('v.shop_id', shopId)
    .select('v.id as version_id', 'v.tree_id', 'v.version', 't.title', 't.symptom', db.raw("JSON_VALUE(v.doc, '$.title') as doc_title"));

const toMeta = (r: MetaRow): PinnedTree => ({ treeId: r.tree_id, versionId: r.version_id, version: r.version, title: r.doc_title ?? r.title, symptom: r.symptom, doc: null });

/**
 * Reads the tree library's tables for walks: the latest published version of
 * a tree (to pin at start) and a pinned version by id. Scoped by shop.
 */
export function createWalkTreeRepository(knex: Knex) {
  return {
    /** The version the tree's library row marks as published (walks start from it); only active trees. */
    async latestPublished(shopId: number, treeId: number): Promise<PinnedTree | undefined> {
      return toPinned(
        await pinnedBase(knex, shopId).andWhere('t.id', treeId).andWhere('t.status', 'active').andWhereRaw('v.id = t.published_version_id').andWhere('v.shop_id', shopId).first(),
      );
    },
    /**
     * A pinned version by id without its document (the title is read from it
     * in the database): for callers that already hold the parsed document.
     */
    async versionMeta(shopId: number, versionId: number, db: Knex = knex): Promise<PinnedTree | undefined> {
      const r: MetaRow | undefined = await metaQuery(db, shopId).andWhere('v.id', versionId).first();
      return r && toMeta(r);
    },
    /** Several versions without their documents in one read (a job's walks list), by version id. */
    async versionsMeta(shopId: number, versionIds: readonly number[]): Promise<Map<number, PinnedTree>> {
      if (versionIds.length === 0) return new Map();
      const rows: MetaRow[] = await metaQuery(knex, shopId).whereIn('v.id', [...new Set(versionIds)]);
      return new Map(rows.map((r) => [r.version_id, toMeta(r)]));
    },
    /** A pinned version by id, whatever has been published since. */
    async version(shopId: number, versionId: number, db: Knex = knex): Promise<PinnedTree | undefined> {
      return toPinned(await pinnedVersionQuery(db, shopId, versionId));
    },
  };
}
