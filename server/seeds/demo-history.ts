import crypto from 'node:crypto';
import type { Knex } from 'knex';
import { parseTree } from '@/trees/engine';
import { createPatternHistoryRepository } from '../repositories/pattern-history-repository';
import { planDemoHistory, type HistoryTree } from './demo-history-plan';

/**
 * Loads about six months of invented jobs and walks into a shop that has no
 * jobs yet (the demo shop on first start; browser tests use it for a fresh
 * shop). Deterministic for a given day. Needs the stock trees installed and
 * an owner, a lead and a tech in the shop. Returns what it wrote, or null
 * when the shop already had jobs or lacks the people.
 */
export async function seedDemoHistory(knex: Knex, shopId: number, opts: { now?: Date; seed?: number; days?: number } = {}) {
  const repo = createPatternHistoryRepository(knex);
  if (await repo.hasJobs(shopId)) return null;
  const facts = await repo.shopFacts(shopId);
  const byRole = (role: string) => facts.people.find((p) => p.role === role)?.id;
  const owner = byRole('owner');
  const lead = byRole('lead') ?? owner;
  const tech = byRole('tech') ?? lead;
  if (!owner || !lead || !tech) return null;
  const trees = new Map<string, HistoryTree>();
  for (const t of facts.trees) {
    const parsed = parseTree(typeof t.doc === 'string' ? JSON.parse(t.doc) : t.doc);
    if (parsed.ok) trees.set(t.slug, { treeId: t.id, versionId: t.version_id, doc: parsed.doc });
  }
  const plan = planDemoHistory({ trees, people: { owner, lead, tech }, altitudeM: facts.altitudeM, now: opts.now ?? new Date(), seed: opts.seed, days: opts.days });
  // Step ids are unique across all shops, so each copy of the history gets fresh ones (undos keep pointing at theirs).
  const fresh = new Map(plan.walks.flatMap((w) => w.steps.map((s) => [s.id, crypto.randomUUID()] as const)));
  return repo.insert(
    shopId,
    plan.jobs.map((j) => ({
      ro_number: j.ro,
      customer_name: j.customer,
      vin: j.vin,
      vehicle_year: j.vehicle.year,
      make: j.vehicle.make,
      model: j.vehicle.model,
      engine: j.vehicle.engine,
      mileage: j.mileage,
      notes: j.notes,
      created_by: j.createdBy,
      created_at: j.createdAt,
      updated_at: j.createdAt,
      install: j.install,
    })),
    plan.walks.map((w) => ({
      job: w.job,
      tree_id: w.tree.treeId,
      tree_version_id: w.tree.versionId,
      altitude_m: facts.altitudeM,
      started_by: w.by,
      status: w.status,
      current_step: w.currentStep,
      step_count: w.stepCount,
      outcome: w.outcome,
      cause_step: w.cause.step,
      cause_code: w.cause.code,
      cause_text: w.cause.text,
      finish_note: w.finishNote,
      finished_by: w.finishedAt ? w.by : null,
      time_spent_s: w.timeSpentS,
      started_at: w.startedAt,
      last_step_at: w.steps.at(-1)?.at ?? null,
      finished_at: w.finishedAt,
      steps: w.steps.map((s) => ({
        id: fresh.get(s.id)!,
        seq: s.seq,
        kind: s.kind,
        event: s.event,
        undoes_step_id: s.undoesId ? fresh.get(s.undoesId)! : null,
        from_step: s.from,
        to_step: s.to,
        verdict: s.verdict,
        reading_value: s.readingValue,
        reading_unit: s.readingUnit,
        judgement: s.judgement,
        note: null,
        user_id: w.by,
        created_at: s.at,
      })),
    })),
  );
}

/** Gives the demo shop (found by its owner's sign-in) its six months of history, if it has no jobs yet. */
export async function seedDemoShopHistory(knex: Knex, ownerEmail: string) {
  const owner = await knex('users').where({ email: ownerEmail }).first('shop_id');
  return owner ? seedDemoHistory(knex, owner.shop_id) : null;
}
