import type { Knex } from 'knex';
import type { TreeDetail, TreeList, TreeListQuery, TreeSummary } from '@/shared/schemas/trees';
import type { InstallType, Symptom } from '@/trees/tree-format';
import { validateTree } from '@/trees/validate';
import { answersToNearestCause, distancesFrom } from '@/trees/graph';
import { createTreeRepository, type TreeListRow } from '../repositories/tree-repository';
import { notFound } from '../errors';
import { iso, parsed, toVersionInfo } from './tree-rows';

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

/** Reading a shop's tree library. Authoring (drafts, publish) builds on the same tables later. */
export function createTreeService(knex: Knex) {
  const repo = createTreeRepository(knex);
  return {
    async list(shopId: number, filter: TreeListQuery): Promise<TreeList> {
      return { trees: (await repo.list(shopId, filter)).map(toSummary) };
    },

    /** One tree with its published document, the validator's figures, its steps in walk order and the causes it can reach. */
    async get(shopId: number, id: number): Promise<TreeDetail> {
      const row = Number.isSafeInteger(id) && id > 0 ? await repo.findById(shopId, id) : undefined;
      if (!row) throw notFound('That tree');
      const [published, versions] = await Promise.all([repo.findPublished(shopId, row), repo.listVersions(shopId, row.id)]);
      const empty = { steps: [], causes: [], refers: [] };
      if (!published) return { tree: toSummary(row), version: null, versions: versions.map(toVersionInfo), stats: null, findings: [], ...empty };

      const { doc, stats, findings } = validateTree(parsed(published.doc));
      const base = { tree: toSummary(row), versions: versions.map(toVersionInfo), findings };
      if (!doc) return { ...base, version: null, stats: null, ...empty };

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
      return { ...base, version: { ...toVersionInfo(published), doc }, stats, steps, causes, refers };
    },
  };
}
