import { describe, expect, it } from 'vitest';
import { replayWalk, type WalkEvent } from '@/trees/engine';
import { isVinCheckDigitValid, decodeModelYear } from '@/shared/vin';
import { loadStockLibrary } from '../services/tree-stock';
import { planDemoHistory, type HistoryTree } from './demo-history-plan';

const trees = new Map<string, HistoryTree>(loadStockLibrary().trees.map(({ doc }, i) => [doc.id, { treeId: i + 1, versionId: 100 + i, doc }]));
const input = { trees, people: { owner: 1, lead: 2, tech: 3 }, altitudeM: 1100, now: new Date('2026-06-15T12:00:00Z') };

describe('demo history plan', () => {
  const plan = planDemoHistory(input);

  it('comes out the same every time for the same day and seed', () => {
    expect(JSON.stringify(planDemoHistory(input))).toBe(JSON.stringify(plan));
    expect(JSON.stringify(planDemoHistory({ ...input, seed: 7 }))).not.toBe(JSON.stringify(plan));
  });

  it('spans about six months with a few hundred walks, all in the past', () => {
    expect(plan.walks.length).toBeGreaterThan(200);
    expect(plan.walks.length).toBeLessThan(600);
    const starts = plan.walks.map((w) => w.startedAt.getTime());
    expect(Math.max(...starts)).toBeLessThan(input.now.getTime());
    expect((Math.max(...starts) - Math.min(...starts)) / 86_400_000).toBeGreaterThan(170);
  });

  it('records only answers the engine accepts, ending where the walk says it stands', () => {
    for (const w of plan.walks) {
      const undone = new Set(w.steps.filter((s) => s.kind === 'undo').map((s) => s.undoesId));
      const live = w.steps.filter((s) => s.kind === 'event' && !undone.has(s.id)).map((s) => s.event as WalkEvent);
      const pos = replayWalk(w.tree.doc, live, { altitudeM: input.altitudeM });
      expect(pos.stepId).toBe(w.currentStep);
      expect(w.stepCount).toBe(live.length);
      if (w.cause.code) expect(w.tree.doc.machine.states[w.currentStep].meta.kind).toBe('cause');
      for (let i = 1; i < w.steps.length; i++) expect(w.steps[i].at.getTime()).toBeGreaterThan(w.steps[i - 1].at.getTime());
      if (w.finishedAt) expect(w.finishedAt.getTime()).toBeGreaterThan((w.steps.at(-1)?.at ?? w.startedAt).getTime());
    }
    expect(plan.walks.some((w) => w.steps.some((s) => s.kind === 'undo'))).toBe(true);
  });

  it('gives every job a VIN that passes the check digit and decodes to its model year', () => {
    for (const j of plan.jobs) {
      expect(isVinCheckDigitValid(j.vin), j.vin).toBe(true);
      expect(decodeModelYear(j.vin)?.year).toBe(j.vehicle.year);
    }
  });

  it('plants repeat causes and comebacks inside a 30-day window, and two just outside it', () => {
    const portLeftOpen = plan.walks.filter((w) => w.cause.code === 'port-left-open' && plan.jobs[w.job].install.some((c) => c.type === 'intake_manifold'));
    expect(new Set(portLeftOpen.map((w) => w.job)).size).toBeGreaterThan(10);
    const gaps: number[] = [];
    for (const a of plan.walks) {
      if (a.outcome !== 'fixed') continue;
      for (const b of plan.walks) {
        if (b.job === a.job || plan.jobs[b.job].vin !== plan.jobs[a.job].vin || b.startedAt <= a.finishedAt!) continue;
        gaps.push((b.startedAt.getTime() - a.finishedAt!.getTime()) / 86_400_000);
      }
    }
    expect(gaps.filter((g) => g <= 30).length).toBeGreaterThanOrEqual(6);
    expect(gaps.filter((g) => g > 30).length).toBeGreaterThanOrEqual(2);
  });
});
