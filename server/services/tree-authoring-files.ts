import type { Knex } from 'knex';
import { validateTree } from '@/trees/validate';
import { diffTrees } from '@/trees/diff';
import type { TreeDoc } from '@/trees/tree-format';
import type { Imported, RetiredTrees, VersionDiff, VersionDoc } from '@/shared/schemas/tree-authoring';
import { createTreeRepository } from '../repositories/tree-repository';
import { createTreeDraftRepository } from '../repositories/tree-draft-repository';
import { badRequest, conflict, notFound } from '../errors';
import { importRefused, versionInfo } from './tree-authoring-records';
import { iso, parsed } from './tree-rows';
import type { Author } from './tree-authoring-service';

/** Import and export of tree files, versions with their documents, history and differences. */
export function createTreeFilesService(knex: Knex) {
  const trees = createTreeRepository(knex);
  const drafts = createTreeDraftRepository(knex);

  async function version(shopId: number, treeId: number, versionId: number) {
    const row = await drafts.findVersion(shopId, treeId, versionId);
    if (!row) throw notFound('That version');
    return row;
  }

  return {
    /**
     * Reads a Baywalk tree file. A file that does not pass the checks is
     * refused whole, with every problem named against its step. A good file
     * becomes a draft: of a new tree, or of the library's tree with the same id.
     */
    async importFile(author: Author, input: { text: string }): Promise<Imported> {
      let json: unknown;
      try {
        json = JSON.parse(input.text);
      } catch (err) {
        throw badRequest(`Nothing was imported: the file is not valid JSON (${(err as Error).message}). Choose a tree file exported from Baywalk.`, { findings: [] });
      }
      const { findings, doc } = validateTree(json);
      const errors = findings.filter((f) => f.severity === 'error');
      if (errors.length || !doc) throw importRefused(errors);
      const warnings = findings.filter((f) => f.severity === 'warning');

      return knex.transaction(async (trx) => {
        const existing = await trees.findBySlug(author.shopId, doc.id, trx);
        if (existing) {
          await drafts.lockTree(trx, author.shopId, existing.id);
          const draft = await drafts.findDraft(author.shopId, existing.id, trx);
          if (draft) {
            throw conflict(`The tree "${existing.title}" (id "${doc.id}") already has a draft. Publish or discard that draft first, then import the file again.`);
          }
          const n = await trees.nextVersionNumber(author.shopId, existing.id, trx);
          await trees.insertVersion({ shop_id: author.shopId, tree_id: existing.id, version: n, state: 'draft', doc, source: 'shop', author_id: author.id, note: 'Imported from a file.', published_at: null }, trx);
          await drafts.bumpRevision(trx, author.shopId, existing.id);
          return { treeId: existing.id, created: false, version: n, warnings };
        }
        const facts = { title: doc.title, symptom: doc.symptom, summary: doc.summary, install_types: [...doc.installTypes] };
        const id = await trees.insertTree({ shop_id: author.shopId, slug: doc.id, status: 'active', source: 'shop', created_by: author.id, ...facts }, trx);
        await trees.insertVersion({ shop_id: author.shopId, tree_id: id, version: 1, state: 'draft', doc, source: 'shop', author_id: author.id, note: 'Imported from a file.', published_at: null }, trx);
        return { treeId: id, created: true, version: 1, warnings };
      });
    },

    /** A version's document as a file: the published one, or the version numbered `n`. */
    async exportFile(shopId: number, treeId: number, n?: number): Promise<{ filename: string; doc: TreeDoc }> {
      const tree = await drafts.findTree(shopId, treeId);
      if (!tree) throw notFound('That tree');
      const row = n ? await drafts.findVersionByNumber(shopId, treeId, n) : tree.published_version_id ? await drafts.findVersion(shopId, treeId, tree.published_version_id) : undefined;
      if (!row) throw notFound(n ? `Version ${n} of this tree` : 'A published version of this tree');
      return { filename: `${tree.slug}-v${row.version}.json`, doc: parsed<TreeDoc>(row.doc) };
    },

    /** Every version, newest first, with who wrote and published it. */
    async history(shopId: number, treeId: number) {
      const tree = await drafts.findTree(shopId, treeId);
      if (!tree) throw notFound('That tree');
      const rows = await knex('tree_versions as v')
        .leftJoin('users as a', 'a.id', 'v.author_id')
        .leftJoin('users as e', 'e.id', 'v.updated_by')
        .leftJoin('users as p', 'p.id', 'v.published_by')
        .where({ 'v.shop_id': shopId, 'v.tree_id': treeId })
        .orderBy('v.version', 'desc')
        .select('v.id', 'v.tree_id', 'v.shop_id', 'v.version', 'v.state', 'v.source', 'v.author_id', 'v.updated_by', 'v.published_by', 'v.note', 'v.created_at', 'v.updated_at', 'v.published_at', 'a.name as author_name', 'e.name as updated_by_name', 'p.name as published_by_name');
      return { tree: { id: tree.id, title: tree.title, slug: tree.slug, status: tree.status, publishedVersionId: tree.published_version_id }, versions: rows.map(versionInfo) };
    },

    async versionDoc(shopId: number, treeId: number, versionId: number): Promise<VersionDoc> {
      const row = await version(shopId, treeId, versionId);
      return { version: versionInfo(row), doc: parsed(row.doc) };
    },

    /** Step-by-step difference between two versions of one tree. */
    async diff(shopId: number, treeId: number, fromId: number, toId: number): Promise<VersionDiff> {
      const [from, to] = await Promise.all([version(shopId, treeId, fromId), version(shopId, treeId, toId)]);
      return { from: versionInfo(from), to: versionInfo(to), ...diffTrees(parsed(from.doc), parsed(to.doc)) };
    },

    async retired(shopId: number): Promise<RetiredTrees> {
      const rows = await drafts.listRetired(shopId);
      return { trees: rows.map((r) => ({ id: r.id, title: r.title, symptom: r.symptom as TreeDoc['symptom'], publishedVersion: r.published_version ?? null, updatedAt: iso(r.updated_at)! })) };
    },
  };
}

export type TreeFilesService = ReturnType<typeof createTreeFilesService>;
