import type { TreeDoc, InstallType } from '@/trees/tree-format';
import { timeSpentSeconds } from '../services/walk-records';
import { seededRandom, type Random } from './demo-history-random';
import { walkTo, type WalkedStep } from './demo-history-walker';
import { customerName, DEMO_VEHICLES, demoVin, INSTALL_TEXT, INSTALL_WEIGHTS, PLANTED, TREES_BY_INSTALL, type DemoVehicle } from './demo-history-vehicles';

const MIN = 60_000;
const DAY = 86_400_000;

/** A published tree the history can walk. */
export interface HistoryTree {
  treeId: number;
  versionId: number;
  doc: TreeDoc;
}

export interface HistoryInput {
  /** Stock trees of the shop by their document id (slug). */
  trees: ReadonlyMap<string, HistoryTree>;
  people: { owner: number; lead: number; tech: number };
  altitudeM: number;
  /** The history ends the day before this instant. */
  now: Date;
  days?: number;
  seed?: number;
}

export interface PlannedJob {
  ro: string;
  customer: string;
  vin: string;
  vehicle: DemoVehicle;
  mileage: number;
  install: Array<{ type: InstallType; text: string }>;
  createdBy: number;
  createdAt: Date;
  notes: string | null;
}

export interface PlannedStep extends WalkedStep {
  id: string;
  seq: number;
  at: Date;
  undoesId: string | null;
}

export interface PlannedWalk {
  job: number;
  tree: HistoryTree;
  by: number;
  startedAt: Date;
  status: 'open' | 'finished';
  currentStep: string;
  stepCount: number;
  outcome: 'fixed' | 'not_fixed' | 'referred' | null;
  cause: { step: string | null; code: string | null; text: string | null };
  finishNote: string | null;
  finishedAt: Date | null;
  timeSpentS: number | null;
  steps: PlannedStep[];
}

/** Days after a walk closed as fixed that the demo's comebacks return; the last two fall outside a 30-day window. */
const RETURN_DAYS = [3, 6, 9, 12, 15, 19, 24, 28, 41, 55];

/**
 * Plans about six months of invented jobs and walks for the demo shop,
 * deterministically (same seed and `now`, same history). Every walk goes
 * through the real tree engine, so the step records are ones the server
 * accepts. Planted: a few causes that keep following one install, and cars
 * that come back within the comeback window (and two just after it).
 */
export function planDemoHistory(input: HistoryInput): { jobs: PlannedJob[]; walks: PlannedWalk[] } {
  const r = seededRandom(input.seed ?? 20260301);
  const days = input.days ?? 182;
  const today = Date.UTC(input.now.getUTCFullYear(), input.now.getUTCMonth(), input.now.getUTCDate());
  const first = today - days * DAY;
  const jobs: PlannedJob[] = [];
  const walks: PlannedWalk[] = [];
  const ctx = { altitudeM: input.altitudeM };
  const walker = (by: number) => (by === input.people.lead ? { detour: 0.05, undo: 0.02 } : by === input.people.tech ? { detour: 0.18, undo: 0.07 } : { detour: 0.1, undo: 0.04 });
  const person = () => r.weighted([[input.people.tech, 55], [input.people.lead, 35], [input.people.owner, 10]] as const);

  function addJob(vehicle: DemoVehicle, vin: string, customer: string, install: PlannedJob['install'], createdAt: Date, notes: string | null = null): number {
    jobs.push({ ro: `KR-${24100 + jobs.length}`, customer, vin, vehicle, mileage: r.int(8, 160) * 1000 + r.int(0, 999), install, createdBy: person(), createdAt, notes });
    return jobs.length - 1;
  }

  function goalFor(tree: HistoryTree, install: InstallType, week: number): string {
    const finals = Object.entries(tree.doc.machine.states).filter(([, s]) => s.type === 'final');
    return r.weighted(
      finals.map(([id, s]) => {
        const planted = PLANTED.find((p) => p.install === install && p.step === id && (p.untilWeek === undefined || week < p.untilWeek));
        return [id, (s.meta.kind === 'cause' ? 1 : 0.5) * (planted?.weight ?? 1)] as const;
      }),
    );
  }

  function addWalk(job: number, tree: HistoryTree, goal: string, startedAt: Date, opts: { open?: boolean; abandon?: boolean } = {}): PlannedWalk {
    const by = person();
    const stopAfter = opts.open ? r.int(1, 3) : opts.abandon ? r.int(2, 4) : undefined;
    const { steps, at } = walkTo(tree.doc, goal, ctx, r, { ...walker(by), stopAfter });
    let clock = startedAt.getTime();
    const planned: PlannedStep[] = steps.map((s, i) => {
      clock += (s.kind === 'undo' ? r.int(1, 2) : s.event?.type === 'reading' ? r.int(4, 12) : r.int(2, 8)) * MIN + r.int(0, 59) * 1000;
      return { ...s, id: r.uuid(), seq: i + 1, at: new Date(clock), undoesId: null };
    });
    planned.forEach((p) => (p.undoesId = p.undoes !== undefined ? planned[p.undoes].id : null));
    // Answers still in force: each undo took one back.
    const live = planned.filter((p) => p.kind === 'event').length - planned.filter((p) => p.kind === 'undo').length;
    const meta = tree.doc.machine.states[at].meta;
    const walk: PlannedWalk = {
      job, tree, by, startedAt, status: 'open', currentStep: at, stepCount: live,
      outcome: null, cause: { step: null, code: null, text: null }, finishNote: null, finishedAt: null, timeSpentS: null, steps: planned,
    };
    if (!opts.open) {
      const finishedAt = new Date(clock + r.int(2, 10) * MIN);
      walk.status = 'finished';
      walk.finishedAt = finishedAt;
      walk.timeSpentS = timeSpentSeconds(startedAt, planned.map((p) => p.at), finishedAt);
      if (meta.kind === 'cause') {
        walk.outcome = r.chance(0.92) ? 'fixed' : 'not_fixed';
        walk.cause = { step: at, code: meta.cause.code, text: meta.title };
        if (walk.outcome === 'not_fixed') walk.finishNote = 'Fix made, but the fault was still there on the road test.';
      } else if (meta.kind === 'refer') {
        walk.outcome = 'referred';
        walk.cause = { step: at, code: null, text: `${meta.refer.to}: ${meta.refer.reason}` };
      } else {
        walk.outcome = 'not_fixed';
        walk.finishNote = 'Customer needed the car back before we finished; booked in again.';
      }
    }
    walks.push(walk);
    return walk;
  }

  // Ordinary visits: one or two a working day (Monday to Saturday), each with a walk.
  for (let day = first; day < today; day += DAY) {
    const weekday = new Date(day).getUTCDay();
    if (weekday === 0) continue;
    const week = Math.floor((day - first) / (7 * DAY));
    const count = weekday === 6 ? r.int(0, 1) : r.weighted([[1, 5], [2, 4], [3, 1]] as const);
    for (let n = 0; n < count; n++) {
      const vehicle = r.pick(DEMO_VEHICLES);
      const main = r.weighted(INSTALL_WEIGHTS);
      const install: PlannedJob['install'] = [{ type: main, text: r.pick(INSTALL_TEXT[main]) }];
      if (main === 'intake_manifold' && r.chance(0.25)) install.push({ type: 'sensor_relocation', text: r.pick(INSTALL_TEXT.sensor_relocation) });
      if (main === 'camshaft' && r.chance(0.3)) install.push({ type: 'intake_manifold', text: r.pick(INSTALL_TEXT.intake_manifold) });
      const createdAt = new Date(day + (14 + r.int(0, 8)) * 3_600_000 + r.int(0, 59) * MIN);
      const job = addJob(vehicle, demoVin(vehicle, r, jobs.length * 7919), customerName(r), install, createdAt);
      const slug = r.weighted(TREES_BY_INSTALL[main]);
      const tree = input.trees.get(slug);
      if (!tree) continue;
      const recent = today - day < 3 * DAY;
      const start = new Date(createdAt.getTime() + r.int(20, 90) * MIN);
      const w = addWalk(job, tree, goalFor(tree, main, week), start, { open: recent && r.chance(0.5), abandon: r.chance(0.04) });
      // Now and then a second symptom on the same visit.
      const second = input.trees.get(r.weighted(TREES_BY_INSTALL[main]));
      if (w.finishedAt && second && second !== tree && r.chance(0.08)) {
        addWalk(job, second, goalFor(second, main, week), new Date(w.finishedAt.getTime() + r.int(10, 60) * MIN));
      }
    }
  }

  // Comebacks: fixed walks whose car returns for the same symptom (the last two after a 30-day window),
  // and one that returns for another symptom (not a comeback).
  const fixed = walks.filter((w) => w.outcome === 'fixed' && w.finishedAt && w.finishedAt.getTime() < today - 60 * DAY);
  const chosen = new Set<PlannedWalk>();
  for (const [i, gap] of RETURN_DAYS.entries()) {
    const pool = fixed.filter((w) => !chosen.has(w) && w.finishedAt!.getTime() + (gap + 1) * DAY < today && w.tree.doc.id === (i % 2 ? 'lean-after-intake-manifold' : w.tree.doc.id));
    if (!pool.length) continue;
    const before = r.pick(pool);
    chosen.add(before);
    const old = jobs[before.job];
    const returnAt = new Date(before.finishedAt!.getTime() + gap * DAY + r.int(1, 6) * 3_600_000);
    const job = addJob(old.vehicle, old.vin, old.customer, old.install, returnAt, `Back after ${old.ro}: the same complaint again.`);
    // Half the time the first fix did not hold (same cause); otherwise the real cause turns up this time.
    const install = old.install[0].type;
    const goal = r.chance(0.5) && before.cause.step ? before.cause.step : goalFor(before.tree, install, 99);
    addWalk(job, before.tree, goal, new Date(returnAt.getTime() + r.int(15, 45) * MIN));
  }
  const other = fixed.find((w) => !chosen.has(w) && w.tree.doc.id === 'lean-after-intake-manifold');
  const pedal = input.trees.get('hard-pedal-after-install');
  if (other && pedal) {
    const old = jobs[other.job];
    const at = new Date(other.finishedAt!.getTime() + 10 * DAY);
    const job = addJob(old.vehicle, old.vin, old.customer, old.install, at, 'Back with a different complaint.');
    addWalk(job, pedal, goalFor(pedal, old.install[0].type, 99), new Date(at.getTime() + 30 * MIN));
  }
  return { jobs, walks };
}

/** A seeded random source, exported for the big-data script so its pool of walks is reproducible too. */
export const historyRandom = (seed: number): Random => seededRandom(seed);
