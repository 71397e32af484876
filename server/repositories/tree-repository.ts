import type { Knex } from 'knex';
import { treesChanged } from './tree-changes';
import type { TreeListQuery } from '@/shared/schemas/trees';

export interface TreeRow {
  id: number;
  shop_id: number;
  slug: string;
  title: string;
  symptom: string;
  install_types: string[] | string;
  summary: string;
  status: 'active' | 'retired';
  source: 'stock' | 'shop';
  published_version_id: number | null;
  revision: number;
  created_by: number | null;
  created_at: Date;
  updated_at: Date;
}

/** A tree with the number and step count of its published version (list and detail). */
export interface TreeListRow extends TreeRow {
  published_version: number | null;
  step_count: number | null;
}

export interface TreeVersionRow {
  id: number;
  tree_id: number;
  shop_id: number;
  version: number;
  state: 'draft' | 'published' | 'retired';
  doc: unknown;
  source: 'stock' | 'shop';
  author_id: number | null;
  author_name?: string | null;
  note: string;
  created_at: Date;
  published_at: Date | null;
}

/** LIKE pattern for a literal search text (%, _ and \ match themselves). */
const likeText = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** Trees and tree versions; every query is scoped by shop. */
export function createTreeRepository(knex: Knex) {
  const withPublished = (shopId: number) =>
    knex('trees as t')
      .leftJoin('tree_versions as v', function () {
        this.on('v.id', '=', 't.published_version_id').andOn('v.shop_id', '=', 't.shop_id');
      })
      .where('t.shop_id', shopId)
      .select('t.*', 'v.version as published_version', knex.raw("JSON_LENGTH(v.doc, '$.machine.states') as step_count"));

  return {
    /** Active trees of a shop, filtered and searched, by title. */
    async list(shopId: number, filter: TreeListQuery): Promise<TreeListRow[]> {
      const q = withPublished(shopId).where('t.status', 'active');
      if (filter.symptom) q.where('t.symptom', filter.symptom);
      if (filter.installType) q.whereRaw('JSON_CONTAINS(t.install_types, JSON_QUOTE(?))', [filter.installType]);
      if (filter.q) {
        const pattern = likeText(filter.q);
        q.where((w) => w.where('t.title', 'like', pattern).orWhere('t.summary', 'like', pattern));
      }
      return q.orderBy([{ column: 't.symptom' }, { column: 't.title' }]);
    },
    async findById(shopId: number, id: number): Promise<TreeListRow | undefined> {
      return withPublished(shopId).where('t.id', id).first();
    },
    async findBySlug(shopId: number, slug: string, trx: Knex = knex): Promise<TreeRow | undefined> {
      return trx<TreeRow>('trees').where({ shop_id: shopId, slug }).first();
    },
    /** The published version with its document, or undefined. */
    async findPublished(shopId: number, tree: Pick<TreeRow, 'id' | 'published_version_id'>, trx: Knex = knex): Promise<TreeVersionRow | undefined> {
      if (!tree.published_version_id) return undefined;
      return trx('tree_versions as v')
        .leftJoin('users as u', 'u.id', 'v.author_id')
        .where({ 'v.shop_id': shopId, 'v.tree_id': tree.id, 'v.id': tree.published_version_id })
        .first('v.*', 'u.name as author_name');
    },
    /** Every version of a tree, newest first, without the documents. */
    async listVersions(shopId: number, treeId: number, trx: Knex = knex): Promise<Omit<TreeVersionRow, 'doc'>[]> {
      return trx('tree_versions as v')
        .leftJoin('users as u', 'u.id', 'v.author_id')
        .where({ 'v.shop_id': shopId, 'v.tree_id': treeId })
        .orderBy('v.version', 'desc')
        .select('v.id', 'v.tree_id', 'v.shop_id', 'v.version', 'v.state', 'v.source', 'v.author_id', 'v.note', 'v.created_at', 'v.published_at', 'u.name as author_name');
    },
    async insertTree(row: Omit<TreeRow, 'id' | 'created_at' | 'updated_at' | 'revision' | 'published_version_id' | 'install_types'> & { install_types: string[] }, trx: Knex = knex): Promise<number> {
      treesChanged(knex, trx);
      const [id] = await trx('trees').insert({ ...row, install_types: JSON.stringify(row.install_types) });
      return id as number;
    },
    /** Adds a version row (documents are written once and never updated in place). */
    async insertVersion(row: Omit<TreeVersionRow, 'id' | 'created_at' | 'author_name'>, trx: Knex = knex): Promise<number> {
      treesChanged(knex, trx);
      const [id] = await trx('tree_versions').insert({ ...row, doc: JSON.stringify(row.doc) });
      return id as number;
    },
    async nextVersionNumber(shopId: number, treeId: number, trx: Knex = knex): Promise<number> {
      const row = await trx('tree_versions').where({ shop_id: shopId, tree_id: treeId }).max<{ n: number | null }[]>({ n: 'version' }).first();
      return Number(row?.n ?? 0) + 1;
    },
    /** Retires the previously published versions and points the tree at a new one, bumping its revision. */
    async publish(shopId: number, treeId: number, versionId: number, facts: Pick<TreeRow, 'title' | 'symptom' | 'summary'> & { install_types: string[] }, trx: Knex = knex): Promise<void> {
      treesChanged(knex, trx);
      await trx('tree_versions').where({ shop_id: shopId, tree_id: treeId, state: 'published' }).whereNot('id', versionId).update({ state: 'retired' });
      await trx('tree_versions').where({ shop_id: shopId, tree_id: treeId, id: versionId }).update({ state: 'published', published_at: trx.fn.now(3) });
      await trx('trees')
        .where({ shop_id: shopId, id: treeId })
        .update({ ...facts, install_types: JSON.stringify(facts.install_types), published_version_id: versionId, updated_at: trx.fn.now(3), revision: trx.raw('revision + 1') });
    },
    /** Whether any version of the tree was made in the shop (not copied from the stock library). */
    async hasShopVersions(shopId: number, treeId: number, trx: Knex = knex): Promise<boolean> {
      return !!(await trx('tree_versions').where({ shop_id: shopId, tree_id: treeId, source: 'shop' }).first('id'));
    },
    /** Ids of every shop (used once at start-up to fill libraries). */
    async allShopIds(): Promise<number[]> {
      return (await knex('shops').select('id')).map((r: { id: number }) => r.id);
    },
  };
}

export type TreeRepository = ReturnType<typeof createTreeRepository>;
