/// <reference types="node" />
/**
 * Builds a large data set for the Patterns benchmark in its OWN database
 * (default baywalk_bench; never the product's or a test's): 100 000 walks
 * and 1 000 000 step records over two years, most in one big shop and the
 * rest in four small ones, with repeat visits of the same VIN (comebacks)
 * and a few guest walks. Walk paths come from the real tree engine (a pool
 * of walks through every stock tree, reused), rows go in as multi-row
 * INSERTs of a few thousand rows.
 *
 *   npm run bench:patterns:data            # then: npm run bench:patterns
 *   BAYWALK_BENCH_DB=other_bench npm run bench:patterns:data
 */
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import knexFactory, { type Knex } from 'knex';
import mysql from 'mysql2';
import { knexSettings } from '@/knexfile';
import { loadConfig } from '@/server/config';
import { migrateLatest } from '@/server/db';
import { hashPassword } from '@/server/auth/passwords';
import { installStockTrees, loadStockLibrary } from '@/server/services/tree-stock';
import { timeSpentSeconds } from '@/server/services/walk-records';
import { seededRandom } from '@/server/seeds/demo-history-random';
import { walkTo, type WalkedStep } from '@/server/seeds/demo-history-walker';
import { DEMO_VEHICLES, demoVin, INSTALL_WEIGHTS, TREES_BY_INSTALL, customerName } from '@/server/seeds/demo-history-vehicles';
import type { TreeDoc } from '@/trees/tree-format';

const ROOT = path.resolve(__dirname, '..');
const DB = process.env.BAYWALK_BENCH_DB ?? 'baywalk_bench';
const WALKS = Number(process.env.BENCH_WALKS ?? 100_000);
const STEPS = Number(process.env.BENCH_STEPS ?? 1_000_000);
const DAYS = 730;
const ALTITUDE = 1100;
const DAY = 86_400_000;
const MIN = 60_000;

if (!DB.includes('bench')) throw new Error(`Refusing to fill "${DB}": the benchmark database name must contain "bench".`);

interface Template { doc: TreeDoc; steps: WalkedStep[]; at: string; kind: 'cause' | 'refer' | 'stopped'; code: string | null; title: string }

/** Walks through every stock tree to every final step, several ways each, through the real engine. */
function templatePool(r: ReturnType<typeof seededRandom>): Map<string, Template[]> {
  const pool = new Map<string, Template[]>();
  for (const { doc } of loadStockLibrary().trees) {
    const list: Template[] = [];
    const finals = Object.entries(doc.machine.states).filter(([, s]) => s.type === 'final');
    for (const [goal, state] of finals) {
      for (const opts of [{ detour: 0 }, { detour: 0.3, undo: 0.1 }, { detour: 0.6, undo: 0.3 }, { detour: 0.8, undo: 0.45 }, { detour: 0.9, undo: 0.6 }]) {
        for (let k = 0; k < 3; k++) {
          const { steps, at } = walkTo(doc, goal, { altitudeM: ALTITUDE }, r, opts);
          const meta = state.meta;
          list.push({ doc, steps, at, kind: meta.kind === 'cause' ? 'cause' : 'refer', code: meta.kind === 'cause' ? meta.cause.code : null, title: meta.kind === 'refer' ? `${meta.refer.to}: ${meta.refer.reason}` : meta.title });
        }
      }
    }
    for (let k = 0; k < 10; k++) {
      const [goal] = r.pick(finals);
      const { steps, at } = walkTo(doc, goal, { altitudeM: ALTITUDE }, r, { detour: 0.5, undo: 0.3, stopAfter: r.int(2, 8) });
      if (doc.machine.states[at].type !== 'final') list.push({ doc, steps, at, kind: 'stopped', code: null, title: '' });
    }
    pool.set(doc.id, list);
  }
  return pool;
}

/** Multi-row INSERT in batches, values escaped by the driver's own escaper. */
async function bulkInsert(knex: Knex, table: string, columns: string[], rows: unknown[][], batch = 2000) {
  const head = `INSERT INTO \`${table}\` (${columns.map((c) => `\`${c}\``).join(',')}) VALUES `;
  for (let i = 0; i < rows.length; i += batch) {
    const values = rows.slice(i, i + batch).map((row) => `(${row.map((v) => mysql.escape(v as Parameters<typeof mysql.escape>[0], false, 'Z')).join(',')})`);
    await knex.raw(head + values.join(','));
  }
}

async function main() {
  const started = Date.now();
  const say = (m: string) => console.log(`bench-data: ${m} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
  execFileSync('bash', ['-c', `source scripts/env.sh && bash scripts/db-up.sh >/dev/null && db_root_sql "DROP DATABASE IF EXISTS \\\`${DB}\\\`;" && bash scripts/db-up.sh "${DB}" >/dev/null`], { cwd: ROOT, stdio: 'inherit' });
  const config = { ...loadConfig().db, database: DB };
  const knex = knexFactory({ ...knexSettings(config), pool: { min: 1, max: 1 } });
  try {
    await migrateLatest(knex);
    say('schema ready');
    const r = seededRandom(424242);
    const hash = await hashPassword('bench-only-password');
    const shops: Array<{ id: number; people: number[]; trees: Map<string, { id: number; version: number }> }> = [];
    for (let s = 0; s < 5; s++) {
      const [shopId] = await knex('shops').insert({ name: s === 0 ? 'Bench Main Shop' : `Bench Small Shop ${s}`, altitude_m: ALTITUDE, comeback_window_days: 30 });
      const people: number[] = [];
      for (const [i, role] of (['owner', 'lead', 'tech', 'tech', 'tech'] as const).entries()) {
        const [id] = await knex('users').insert({ shop_id: shopId, email: `${role}${i}-shop${shopId}@bench.example`, name: `${role} ${i} of shop ${shopId}`, role, password_hash: hash });
        people.push(id as number);
      }
      await installStockTrees(knex, shopId as number);
      const trees = new Map<string, { id: number; version: number }>();
      for (const t of await knex('trees').where({ shop_id: shopId }).select('id', 'slug', 'published_version_id')) trees.set(t.slug, { id: t.id, version: t.published_version_id });
      shops.push({ id: shopId as number, people, trees });
    }
    const pool = templatePool(r);
    const byLength = [...pool.values()].flat().sort((a, b) => a.steps.length - b.steps.length);
    say(`${byLength.length} engine walks in the pool (lengths ${byLength[0].steps.length}–${byLength.at(-1)!.steps.length})`);

    const jobs: unknown[][] = [];
    const changes: unknown[][] = [];
    const walks: unknown[][] = [];
    const steps: unknown[][] = [];
    const now = Date.now();
    const start = now - DAYS * DAY;
    const visits: Array<{ shop: number; vin: string; vehicle: (typeof DEMO_VEHICLES)[number]; customer: string; install: string; slug: string; at: number }> = [];
    let stepTotal = 0;
    let stepId = 0;
    for (let w = 0; w < WALKS; w++) {
      const shopIdx = r.chance(0.9) ? 0 : r.int(1, 4);
      const shop = shops[shopIdx];
      const at = start + Math.floor((w / WALKS) * (DAYS - 1) * DAY) + r.int(8, 18) * 3_600_000;
      // A tenth of visits are the same car coming back 1–60 days after an earlier one.
      const back = visits.length > 50 && r.chance(0.1) ? visits[visits.length - r.int(1, 50)] : undefined;
      const guest = !back && r.chance(0.03);
      let jobId: number | null = null;
      let slug: string;
      if (guest) slug = r.pick([...pool.keys()]);
      else {
        const vehicle = back?.vehicle ?? r.pick(DEMO_VEHICLES);
        const install = back?.install ?? r.weighted(INSTALL_WEIGHTS);
        slug = back && r.chance(0.6) ? back.slug : r.weighted(TREES_BY_INSTALL[install as keyof typeof TREES_BY_INSTALL]);
        const vin = back?.vin ?? demoVin(vehicle, r, w);
        const customer = back?.customer ?? customerName(r);
        const jobAt = back ? Math.max(at, back.at + r.int(1, 60) * DAY) : at;
        jobId = jobs.length + 1;
        jobs.push([jobId, shop.id, `B-${jobId}`, customer, vin, vehicle.year, vehicle.make, vehicle.model, vehicle.engine, r.int(5, 200) * 1000, shop.people[r.int(0, 4)], new Date(Math.min(jobAt, now - MIN)), new Date(Math.min(jobAt, now - MIN))]);
        changes.push([jobId, shop.id, 0, install, 'Bench install']);
        if (r.chance(0.2)) changes.push([jobId, shop.id, 1, install === 'intake_manifold' ? 'sensor_relocation' : 'other', 'Second change']);
        visits.push({ shop: shop.id, vin, vehicle, customer, install, slug, at: jobAt });
      }
      // Keep the average at STEPS / WALKS: pick a longer walk when behind, a shorter one when ahead.
      const behind = stepTotal < (STEPS / WALKS) * w;
      const candidates = pool.get(slug)!;
      const leaning = candidates.filter((c) => (behind ? c.steps.length >= STEPS / WALKS : c.steps.length < STEPS / WALKS));
      let t = leaning.length ? r.pick(leaning) : r.pick(candidates);
      // The last walk makes the total exact when the pool has a walk of the missing length.
      if (w === WALKS - 1) t = byLength.find((c) => c.steps.length === STEPS - stepTotal) ?? t;
      const tree = shop.trees.get(t.doc.id)!;
      const walkId = w + 1;
      const by = shop.people[r.int(0, 4)];
      const begin = (jobId ? (jobs[jobId - 1][11] as Date).getTime() : at) + r.int(10, 90) * MIN;
      let clock = begin;
      const ids: string[] = [];
      const times: Date[] = [];
      t.steps.forEach((s, i) => {
        clock += r.int(1, 9) * MIN;
        const id = `b0000000-0000-4000-8000-${(++stepId).toString(16).padStart(12, '0')}`;
        ids.push(id);
        times.push(new Date(clock));
        const j = s.judgement as { verdict?: string; summary?: string } | null;
        steps.push([id, walkId, shop.id, i + 1, s.kind, s.event ? JSON.stringify(s.event) : null, s.undoes !== undefined ? ids[s.undoes] : null, s.from, s.to, s.verdict, s.readingValue, s.readingUnit, j ? JSON.stringify({ verdict: j.verdict, summary: j.summary }) : null, by, new Date(clock)]);
      });
      stepTotal += t.steps.length;
      const open = clock > now - 2 * DAY && r.chance(0.5);
      const finishedAt = open ? null : new Date(clock + r.int(2, 10) * MIN);
      const outcome = open ? null : t.kind === 'cause' ? (r.chance(0.9) ? 'fixed' : 'not_fixed') : t.kind === 'refer' ? 'referred' : 'not_fixed';
      const live = t.steps.filter((s) => s.kind === 'event').length - t.steps.filter((s) => s.kind === 'undo').length;
      walks.push([
        walkId, shop.id, jobId, tree.id, tree.version, ALTITUDE, by, open ? 'open' : 'finished', t.at, live, outcome,
        open || t.kind === 'stopped' ? null : t.at, open ? null : t.code, open ? null : t.title || null,
        open ? null : by, finishedAt ? timeSpentSeconds(new Date(begin), times, finishedAt) : null, new Date(begin), times.at(-1) ?? null, finishedAt,
      ]);
    }
    say(`planned ${jobs.length} jobs, ${walks.length} walks, ${steps.length} step records`);
    await knex.raw('SET SESSION foreign_key_checks = 0, unique_checks = 0');
    await bulkInsert(knex, 'jobs', ['id', 'shop_id', 'ro_number', 'customer_name', 'vin', 'vehicle_year', 'make', 'model', 'engine', 'mileage', 'created_by', 'created_at', 'updated_at'], jobs);
    await bulkInsert(knex, 'job_changes', ['job_id', 'shop_id', 'position', 'install_type', 'description'], changes);
    say('jobs in');
    await bulkInsert(knex, 'walks', ['id', 'shop_id', 'job_id', 'tree_id', 'tree_version_id', 'altitude_m', 'started_by', 'status', 'current_step', 'step_count', 'outcome', 'cause_step', 'cause_code', 'cause_text', 'finished_by', 'time_spent_s', 'started_at', 'last_step_at', 'finished_at'], walks);
    say('walks in');
    await bulkInsert(knex, 'walk_steps', ['id', 'walk_id', 'shop_id', 'seq', 'kind', 'event', 'undoes_step_id', 'from_step', 'to_step', 'verdict', 'reading_value', 'reading_unit', 'judgement', 'user_id', 'created_at'], steps, 4000);
    await knex.raw('SET SESSION foreign_key_checks = 1, unique_checks = 1');
    say('step records in');
    await knex.raw('ANALYZE TABLE jobs, job_changes, walks, walk_steps');
    const [[counts]] = await knex.raw('SELECT (SELECT COUNT(*) FROM walks) AS walks, (SELECT COUNT(*) FROM walk_steps) AS steps, (SELECT COUNT(*) FROM jobs) AS jobs');
    say(`done: ${counts.walks} walks, ${counts.steps} step records, ${counts.jobs} jobs in ${DB}`);
  } finally {
    await knex.destroy();
  }
}

main().catch((err) => {
  console.error(`bench-data: failed: ${err.message}`);
  process.exit(1);
});
