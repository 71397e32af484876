import type { Knex } from 'knex';
import { treeDocSchema, type TreeDoc } from '@/trees/tree-format';
import { stepsInOrder, transitionsOf } from '@/trees/graph';
import { VERDICT_LABELS } from '@/shared/readings/verdict-labels';
import type { Verdict } from '@/shared/readings/reading-kinds';
import type { TreeStatsAnswer } from '@/shared/schemas/tree-authoring';
import { createTreeStatsRepository } from '../repositories/tree-stats-repository';
import { createTreeDraftRepository } from '../repositories/tree-draft-repository';
import { notFound } from '../errors';
import { parsed } from './tree-rows';

const minutes = (s: number | null) => (s === null ? null : Math.round((s / 60) * 10) / 10);

type StepStats = TreeStatsAnswer['steps'][number];

/** The answers a step offers, keyed as the statistics count them (verdict for readings, event type otherwise). */
function optionsOf(doc: TreeDoc, stepId: string): StepStats['options'] {
  const state = doc.machine.states[stepId];
  return transitionsOf(state).map(({ event, t }) => {
    const verdict = t.guard?.params.is;
    if (verdict) return { key: verdict, label: VERDICT_LABELS[verdict as Verdict] ?? verdict, target: t.target, count: 0 };
    return { key: event, label: event === 'done' ? 'Done' : (t.description ?? event), target: t.target, count: 0 };
  });
}

/** Step statistics of a tree from the shop's finished walks, labelled with the version being looked at. */
export function createTreeStatsService(knex: Knex) {
  const stats = createTreeStatsRepository(knex);
  const drafts = createTreeDraftRepository(knex);

  return {
    async forTree(shopId: number, treeId: number, versionId?: number): Promise<TreeStatsAnswer> {
      const tree = await drafts.findTree(shopId, treeId);
      if (!tree) throw notFound('That tree');
      const labelVersion = versionId ?? tree.published_version_id;
      const row = labelVersion ? await drafts.findVersion(shopId, treeId, labelVersion) : undefined;
      if (versionId && !row) throw notFound('That version');
      const docParse = row ? treeDocSchema.safeParse(parsed(row.doc)) : undefined;
      const doc = docParse?.success ? docParse.data : undefined;

      const [answers, causes, medians, endings] = await Promise.all([
        stats.answerCounts(shopId, treeId, versionId),
        stats.causeCounts(shopId, treeId, versionId),
        stats.toCauseMedians(shopId, treeId, versionId),
        stats.endings(shopId, treeId, versionId),
      ]);

      // Start from the version's own steps (so answers never taken show 0), then add steps only older versions had.
      const steps = new Map<string, StepStats>();
      if (doc) {
        for (const id of stepsInOrder(doc)) {
          const meta = doc.machine.states[id].meta;
          if (meta.kind === 'cause' || meta.kind === 'refer') continue;
          steps.set(id, { stepId: id, title: meta.title, kind: meta.kind, total: 0, options: optionsOf(doc, id) });
        }
      }
      for (const a of answers) {
        let step = steps.get(a.from_step);
        if (!step) {
          step = { stepId: a.from_step, title: a.from_step, kind: 'unknown', total: 0, options: [] };
          steps.set(a.from_step, step);
        }
        step.total += a.n;
        const option = step.options.find((o) => o.key === a.answer);
        if (option) option.count += a.n;
        else step.options.push({ key: a.answer, label: VERDICT_LABELS[a.answer as Verdict] ?? a.answer, target: null, count: a.n });
      }

      const causeTitle = (stepId: string) => {
        const meta = doc?.machine.states[stepId]?.meta;
        return meta?.title ?? stepId;
      };
      return {
        walks: {
          total: endings.total,
          finished: endings.finished,
          open: endings.open,
          toCause: endings.to_cause,
          toRefer: endings.to_refer,
          unfinished: endings.unfinished,
        },
        toCause: { medianSteps: medians.median_steps, medianMinutes: minutes(medians.median_seconds) },
        causes: causes.map((c) => ({
          stepId: c.cause_step,
          code: c.cause_code,
          title: causeTitle(c.cause_step),
          count: c.n,
          medianSteps: c.median_steps,
          medianMinutes: minutes(c.median_seconds),
        })),
        steps: [...steps.values()],
      };
    },
  };
}

export type TreeStatsService = ReturnType<typeof createTreeStatsService>;
