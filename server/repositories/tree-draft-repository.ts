import type { Knex } from 'knex';
import { treesChanged } from './tree-changes';
import type { TreeRow, TreeVersionRow } from './tree-repository';

/** A version row with the names of who wrote, last saved and published it. */
export interface AuthoredVersionRow extends TreeVersionRow {
  updated_by: number | null;
  updated_at: Date | null;
  published_by: number | null;
  updated_by_name?: string | null;
  published_by_name?: string | null;
}

/**
 * Drafts and the tree row's status and revision, for authoring. Every query
 * is scoped by shop. The revision on `trees` is the optimistic lock: a write
 * names the revision it was based on and only succeeds if it is still current.
 */
export function createTreeDraftRepository(knex: Knex) {
  const versions = (db: Knex, shopId: number) =>
    db('tree_versions as v')
      .leftJoin('users as a', 'a.id', 'v.author_id')
      .leftJoin('users as e', 'e.id', 'v.updated_by')
      .leftJoin('users as p', 'p.id', 'v.published_by')
      .where('v.shop_id', shopId)
      .select('v.*', 'a.name as author_name', 'e.name as updated_by_name', 'p.name as published_by_name');

  return {
    /** The tree row, locked until the transaction ends (serialises writers of one tree). */
    async lockTree(trx: Knex.Transaction, shopId: number, treeId: number): Promise<TreeRow | undefined> {
      return trx<TreeRow>('trees').where({ shop_id: shopId, id: treeId }).forUpdate().first();
    },
    async findTree(shopId: number, treeId: number): Promise<TreeRow | undefined> {
      return knex<TreeRow>('trees').where({ shop_id: shopId, id: treeId }).first();
    },
    /** The tree's draft, if it has one. */
    async findDraft(shopId: number, treeId: number, db: Knex = knex): Promise<AuthoredVersionRow | undefined> {
      return versions(db, shopId).andWhere({ 'v.tree_id': treeId, 'v.state': 'draft' }).first();
    },
    /** One version of a tree by id, with its document. */
    async findVersion(shopId: number, treeId: number, versionId: number): Promise<AuthoredVersionRow | undefined> {
      return versions(knex, shopId).andWhere({ 'v.tree_id': treeId, 'v.id': versionId }).first();
    },
    /** One version of a tree by its number, with its document. */
    async findVersionByNumber(shopId: number, treeId: number, version: number): Promise<AuthoredVersionRow | undefined> {
      return versions(knex, shopId).andWhere({ 'v.tree_id': treeId, 'v.version': version }).first();
    },
    /** Moves the revision on by one if it still is `expected`; false when someone else wrote first. */
    async bumpRevision(trx: Knex.Transaction, shopId: number, treeId: number, expected?: number): Promise<boolean> {
      treesChanged(knex, trx);
      const q = trx('trees').where({ shop_id: shopId, id: treeId });
      if (expected !== undefined) q.andWhere('revision', expected);
      const n = await q.update({ revision: trx.raw('revision + 1'), updated_at: trx.fn.now(3) });
      return n === 1;
    },
    async revisionOf(trx: Knex.Transaction, shopId: number, treeId: number): Promise<number> {
      const row = await trx('trees').where({ shop_id: shopId, id: treeId }).first('revision');
      return Number(row?.revision ?? 0);
    },
    /** Replaces the document of a draft (only drafts: published versions never change). */
    async updateDraft(trx: Knex.Transaction, shopId: number, versionId: number, fields: { doc: unknown; note?: string; updated_by: number }): Promise<void> {
      treesChanged(knex, trx);
      const { doc, ...rest } = fields;
      await trx('tree_versions')
        .where({ shop_id: shopId, id: versionId, state: 'draft' })
        .update({ ...rest, doc: JSON.stringify(doc), updated_at: trx.fn.now(3) });
    },
    async deleteDraft(trx: Knex.Transaction, shopId: number, versionId: number): Promise<void> {
      treesChanged(knex, trx);
      await trx('tree_versions').where({ shop_id: shopId, id: versionId, state: 'draft' }).delete();
    },
    /** Stamps the note and the publisher on a draft about to be published. */
    async stampPublisher(trx: Knex.Transaction, shopId: number, versionId: number, fields: { note: string; published_by: number }): Promise<void> {
      treesChanged(knex, trx);
      await trx('tree_versions').where({ shop_id: shopId, id: versionId, state: 'draft' }).update(fields);
    },
    async setStatus(trx: Knex.Transaction, shopId: number, treeId: number, status: 'active' | 'retired'): Promise<void> {
      treesChanged(knex, trx);
      await trx('trees').where({ shop_id: shopId, id: treeId }).update({ status, updated_at: trx.fn.now(3), revision: trx.raw('revision + 1') });
    },
    /** Retired trees of a shop, by title (authors bring them back from here). */
    async listRetired(shopId: number): Promise<Array<TreeRow & { published_version: number | null }>> {
      return knex('trees as t')
        .leftJoin('tree_versions as v', function () {
          this.on('v.id', '=', 't.published_version_id').andOn('v.shop_id', '=', 't.shop_id');
        })
        .where({ 't.shop_id': shopId, 't.status': 'retired' })
        .orderBy('t.title')
        .select('t.*', 'v.version as published_version');
    },
  };
}

export type TreeDraftRepository = ReturnType<typeof createTreeDraftRepository>;
