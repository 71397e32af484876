import type { Knex } from 'knex';
import { validateTree } from '@/trees/validate';
import type { TreeDoc } from '@/trees/tree-format';
import type { Draft, DraftSaved, Published } from '@/shared/schemas/tree-authoring';
import { createTreeRepository } from '../repositories/tree-repository';
import { createTreeDraftRepository, type AuthoredVersionRow } from '../repositories/tree-draft-repository';
import { AppError, badRequest, conflict, notFound } from '../errors';
import { draftHasErrors, slugFrom, starterDoc, toDraft } from './tree-authoring-records';
import { iso, parsed } from './tree-rows';

/** Who is acting: a signed-in author of a shop. */
export interface Author {
  id: number;
  shopId: number;
}

const treeMissing = () => notFound('That tree');
const noDraft = () => notFound('A draft of this tree');

function staleSave(draft: AuthoredVersionRow | undefined, current: number): AppError {
  const who = draft?.updated_by_name ?? draft?.author_name ?? 'Someone else';
  return conflict(
    `${who} saved this tree after you opened it, so your changes were not saved over theirs. Reload the draft to see their changes, then make yours again.`,
    { revision: current, savedBy: who, savedAt: iso(draft?.updated_at ?? draft?.created_at) },
  );
}

/** Drafts of a tree: create, start from the published version, save with a revision check, discard, publish, retire. */
export function createTreeAuthoringService(knex: Knex) {
  const trees = createTreeRepository(knex);
  const drafts = createTreeDraftRepository(knex);

  async function draftAnswer(shopId: number, treeId: number, db: Knex = knex): Promise<Draft> {
    const tree = await db('trees as t')
      .leftJoin('tree_versions as v', 'v.id', 't.published_version_id')
      .where({ 't.shop_id': shopId, 't.id': treeId })
      .first('t.id', 't.slug', 't.revision', 'v.version as published_version');
    if (!tree) throw treeMissing();
    const row = await drafts.findDraft(shopId, treeId, db);
    if (!row) throw noDraft();
    return toDraft(row, tree, tree.published_version ?? null, validateTree(parsed(row.doc)).findings);
  }

  /** Locks the tree for a write and checks the revision the author based the write on. */
  async function lockForWrite(trx: Knex.Transaction, author: Author, treeId: number, revision: number | undefined) {
    const tree = await drafts.lockTree(trx, author.shopId, treeId);
    if (!tree) throw treeMissing();
    const draft = await drafts.findDraft(author.shopId, treeId, trx);
    if (revision !== undefined && tree.revision !== revision) throw staleSave(draft, tree.revision);
    return { tree, draft };
  }

  async function freeSlug(trx: Knex, shopId: number, wanted: string | undefined, title: string): Promise<string> {
    if (wanted) {
      if (await trees.findBySlug(shopId, wanted, trx)) {
        throw conflict(`A tree with the id "${wanted}" is already in your library. Choose another id.`, { fields: { slug: 'This id is taken.' } });
      }
      return wanted;
    }
    const base = slugFrom(title);
    for (let n = 1; ; n++) {
      const slug = n === 1 ? base : `${base}-${n}`;
      if (!(await trees.findBySlug(shopId, slug, trx))) return slug;
    }
  }

  return {
    draft: draftAnswer,

    /** A new tree in the library, opened as a draft with one question to write. */
    async create(author: Author, input: { title: string; symptom: TreeDoc['symptom']; installTypes: TreeDoc['installTypes']; summary: string; slug?: string }): Promise<Draft> {
      const treeId = await knex.transaction(async (trx) => {
        const slug = await freeSlug(trx, author.shopId, input.slug, input.title);
        const facts = { title: input.title, symptom: input.symptom, summary: input.summary, install_types: input.installTypes };
        const id = await trees.insertTree({ shop_id: author.shopId, slug, status: 'active', source: 'shop', created_by: author.id, ...facts }, trx);
        await trees.insertVersion(
          { shop_id: author.shopId, tree_id: id, version: 1, state: 'draft', doc: starterDoc(slug, input), source: 'shop', author_id: author.id, note: '', published_at: null },
          trx,
        );
        return id;
      });
      return draftAnswer(author.shopId, treeId);
    },

    /** A new draft copied from the published version; refused while another draft exists. */
    async startDraft(author: Author, treeId: number, input: { revision?: number } = {}): Promise<Draft> {
      await knex.transaction(async (trx) => {
        const { tree, draft } = await lockForWrite(trx, author, treeId, input.revision);
        if (draft) {
          const who = draft.updated_by_name ?? draft.author_name ?? 'someone';
          throw conflict(`This tree already has a draft (version ${draft.version}, last saved by ${who}). Open that draft instead: a tree has one draft at a time.`, {
            versionId: draft.id,
          });
        }
        const published = await trees.findPublished(author.shopId, tree, trx);
        const doc = published
          ? parsed(published.doc)
          : starterDoc(tree.slug, { title: tree.title, symptom: tree.symptom as TreeDoc['symptom'], installTypes: parsed(tree.install_types), summary: tree.summary });
        const version = await trees.nextVersionNumber(author.shopId, treeId, trx);
        await trees.insertVersion({ shop_id: author.shopId, tree_id: treeId, version, state: 'draft', doc, source: 'shop', author_id: author.id, note: '', published_at: null }, trx);
        await drafts.bumpRevision(trx, author.shopId, treeId);
      });
      return draftAnswer(author.shopId, treeId);
    },

    /** Saves the draft if nobody saved since `revision`; answers the new revision and the checks' findings. */
    async save(author: Author, treeId: number, input: { revision: number; doc: Record<string, unknown>; note?: string }): Promise<DraftSaved> {
      if (input.doc.id !== undefined) {
        const tree = await drafts.findTree(author.shopId, treeId);
        if (!tree) throw treeMissing();
        if (input.doc.id !== tree.slug) {
          throw badRequest(`The tree id must stay "${tree.slug}"; to make a different tree, create a new one.`, { fields: { 'doc.id': `Keep "${tree.slug}".` } });
        }
      }
      return knex.transaction(async (trx) => {
        const { draft } = await lockForWrite(trx, author, treeId, input.revision);
        if (!draft) throw conflict('This draft was published or discarded since you opened it, so there is nothing to save into. Reload the tree to see where it stands.');
        await drafts.updateDraft(trx, author.shopId, draft.id, { doc: input.doc, updated_by: author.id, ...(input.note !== undefined ? { note: input.note } : {}) });
        await drafts.bumpRevision(trx, author.shopId, treeId, input.revision);
        return { revision: await drafts.revisionOf(trx, author.shopId, treeId), updatedAt: new Date().toISOString(), findings: validateTree(input.doc).findings };
      });
    },

    /** Throws the draft away; the published version stays as it was. */
    async discard(author: Author, treeId: number, revision?: number): Promise<void> {
      await knex.transaction(async (trx) => {
        const { draft } = await lockForWrite(trx, author, treeId, revision);
        if (!draft) throw noDraft();
        await drafts.deleteDraft(trx, author.shopId, draft.id);
        await drafts.bumpRevision(trx, author.shopId, treeId);
      });
    },

    /**
     * Publishes the draft: refused while the checks find errors (naming the
     * steps), or while they find warnings the author has not accepted. Walks
     * already started keep the version they pinned.
     */
    async publish(author: Author, treeId: number, input: { revision: number; note: string; acceptWarnings: boolean }): Promise<Published> {
      return knex.transaction(async (trx) => {
        const { tree, draft } = await lockForWrite(trx, author, treeId, input.revision);
        if (!draft) throw noDraft();
        const { findings, doc } = validateTree(parsed(draft.doc));
        const errors = findings.filter((f) => f.severity === 'error');
        if (doc && doc.id !== tree.slug) {
          errors.push({ severity: 'error', code: 'schema', message: `The tree id is "${doc.id}", but this tree is "${tree.slug}". Set the id back to "${tree.slug}".` });
        }
        if (errors.length || !doc) throw draftHasErrors(errors);
        const warnings = findings.filter((f) => f.severity === 'warning');
        if (warnings.length && !input.acceptWarnings) {
          throw new AppError(409, 'warnings_not_accepted', `The checks found ${warnings.length === 1 ? 'a warning' : `${warnings.length} warnings`}. Read ${warnings.length === 1 ? 'it' : 'them'}, then publish again and accept ${warnings.length === 1 ? 'it' : 'them'}.`, {
            findings: warnings,
          });
        }
        await drafts.stampPublisher(trx, author.shopId, draft.id, { note: input.note, published_by: author.id });
        await trees.publish(author.shopId, treeId, draft.id, { title: doc.title, symptom: doc.symptom, summary: doc.summary, install_types: [...doc.installTypes] }, trx);
        return { treeId, versionId: draft.id, version: draft.version, revision: await drafts.revisionOf(trx, author.shopId, treeId) };
      });
    },

    /** Retires or brings back a tree. Retired trees leave the start-a-walk picker; their history and walks stay. */
    async setStatus(author: Author, treeId: number, status: 'active' | 'retired') {
      return knex.transaction(async (trx) => {
        const tree = await drafts.lockTree(trx, author.shopId, treeId);
        if (!tree) throw treeMissing();
        if (status === 'active' && !tree.published_version_id) {
          throw conflict('This tree has never been published, so there is nothing to bring back. Publish its draft instead.');
        }
        if (tree.status !== status) await drafts.setStatus(trx, author.shopId, treeId, status);
        return { treeId, status, revision: await drafts.revisionOf(trx, author.shopId, treeId) };
      });
    },
  };
}

export type TreeAuthoringService = ReturnType<typeof createTreeAuthoringService>;
