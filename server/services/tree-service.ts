import type { Knex } from 'knex';
import type { TreeDetail, TreeList, TreeListQuery, TreeSummary } from '@/shared/schemas/trees';
import type { InstallType, Symptom } from '@/trees/tree-format';
import { validateTree } from '@/trees/validate';
import { answersToNearestCause, distancesFrom } from '@/trees/graph';
import { createTreeRepository, type TreeListRow } from '../repositories/tree-repository';
import { notFound } from '../errors';
import { iso, parsed, toVersionInfo } from './tree-rows';
import { versionCache } from './version-cache';
import { treeWrites } from '../repositories/tree-changes';
import { shortCache } from '../auth/short-cache';

function toSummary(row: TreeListRow): TreeSummary {
  return {
    id: row.id,
    slug: row.slug,
    title: row.title,
    symptom: row.symptom as Symptom,
    installTypes: parsed<InstallType[]>(row.install_types),
    summary: row.summary,
    status: row.status,
    source: row.source,
    publishedVersion: row.published_version ?? null,
    steps: row.step_count === null || row.step_count === undefined ? null : Number(row.step_count),
    updatedAt: iso(row.updated_at)!,
  };
}

/** What the tree page shows of a published document: the validator's figures, steps in walk order, causes and referrals. */
function publishedView(raw: unknown) {
  const { doc, stats, findings } = validateTree(raw);
  if (!doc) return { doc: null, stats: null, findings, steps: [], causes: [], refers: [] };
  const depth = distancesFrom(doc, doc.machine.initial);
  const states = doc.machine.states;
  const steps = [...depth].map(([stepId, d]) => ({
    id: stepId,
    kind: states[stepId].meta.kind,
    title: states[stepId].meta.title,
    cautions: states[stepId].meta.cautions,
    depth: d,
    toCause: answersToNearestCause(doc, stepId),
  }));
  const causes = steps.flatMap((s) => {
    const meta = states[s.id].meta;
    return meta.kind === 'cause' ? [{ stepId: s.id, code: meta.cause.code, title: meta.title, area: meta.cause.area, fix: meta.cause.fix, shortest: s.depth }] : [];
  });
  const refers = steps.flatMap((s) => {
    const meta = states[s.id].meta;
    return meta.kind === 'refer' ? [{ stepId: s.id, title: meta.title, to: meta.refer.to, reason: meta.refer.reason }] : [];
  });
  causes.sort((a, b) => a.shortest - b.shortest || a.title.localeCompare(b.title));
  return { doc, stats, findings, steps, causes, refers };
}

// Shared by every request of this process (the answers are read-only JSON, never mutated).
const publishedViews = versionCache<ReturnType<typeof publishedView>>();

/**
 * How long a tree page, once built, answers every request for it in this
 * process. Any tree write made through the process is seen at once (the
 * write count is in the key); one made by another server process sharing the
 * database shows within this time. Technicians open the same few pages all
 * day, and four queries and 40 KB of JSON each time was most of its cost.
 */
export const TREE_PAGE_CACHE_MS = 1000;

/** Reading a shop's tree library. Authoring (drafts, publish) builds on the same tables later. */
export function createTreeService(knex: Knex) {
  const repo = createTreeRepository(knex);
  const pages = shortCache<string, Readonly<TreeDetail>>(TREE_PAGE_CACHE_MS, 2000);
  const service = {
    async list(shopId: number, filter: TreeListQuery): Promise<TreeList> {
      return { trees: (await repo.list(shopId, filter)).map(toSummary) };
    },

    /**
     * The tree page as the API sends it: kept for a moment and frozen, so the
     * route table serializes it once for every request it answers.
     */
    page(shopId: number, id: number): Promise<Readonly<TreeDetail>> {
      return pages.get(`${treeWrites(knex)}:${shopId}:${id}`, async () => Object.freeze(await service.get(shopId, id)));
    },

    /** One tree with its published document, the validator's figures, its steps in walk order and the causes it can reach. */
    async get(shopId: number, id: number): Promise<TreeDetail> {
      const row = Number.isSafeInteger(id) && id > 0 ? await repo.findById(shopId, id) : undefined;
      if (!row) throw notFound('That tree');
      // Once a version's view is cached, its row in the version list is all that is needed: the 40 KB document is not fetched.
      const cached = row.published_version_id ? publishedViews.peek(row.published_version_id) : undefined;
      const [fetched, versions] = await Promise.all([cached ? undefined : repo.findPublished(shopId, row), repo.listVersions(shopId, row.id)]);
      const published = cached ? versions.find((v) => v.id === row.published_version_id) : fetched;
      const empty = { steps: [], causes: [], refers: [] };
      if (!published) return { tree: toSummary(row), version: null, versions: versions.map(toVersionInfo), stats: null, findings: [], ...empty };

      // Validation and path analysis depend only on the version's document, which never changes: once per version.
      const { doc, stats, findings, steps, causes, refers } = cached ?? publishedViews.get(published.id, () => publishedView(parsed(fetched!.doc)));
      const base = { tree: toSummary(row), versions: versions.map(toVersionInfo), findings };
      if (!doc) return { ...base, version: null, stats: null, ...empty };
      return { ...base, version: { ...toVersionInfo(published), doc }, stats, steps, causes, refers };
    },
  };
  return service;
}
