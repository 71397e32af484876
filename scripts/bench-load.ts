/// <reference types="node" />
// npm run bench:load — load benchmark on loopback with autocannon, 50 connections:
// the walk step append and the tree fetch of the real server, each next to a
// bare Express endpoint measured in the same run (the ratio is what counts on
// a shared, noisy machine). Uses its own database (baywalk_bench_load by
// default) with the demo shop; never touches the product's database.
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import autocannon, { type Result } from 'autocannon';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '@/server/seeds/demo-people';
import { ROOT, freePort, freshDemoDatabase, spawnServer } from './bench-support';

// Its own variable: BAYWALK_BENCH_DB names the patterns benchmark's database, which this script must never drop.
const DB = process.env.BAYWALK_LOAD_BENCH_DB ?? 'baywalk_bench_load';
if (!/^\w*bench\w*$/.test(DB)) throw new Error(`bench: refusing to reset "${DB}": the load benchmark's database name must contain "bench"`);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const WALKS = Number(process.env.BENCH_WALKS ?? 10000);
/** The paced runs' offered load, across all connections: about a third of the step append's saturated throughput here, so latency is mostly service time, not queueing. */
const RATE = Number(process.env.BENCH_RATE ?? 100);
const TARGETS = { step: 5, tree: 2 };
/** BENCH_ONLY=tree or =step measures just that one (with its bare yardstick); BENCH_PROFILE=1 writes the server's CPU profile to test-artifacts/. */
const ONLY = process.env.BENCH_ONLY;
const PROFILE_DIR = process.env.BENCH_PROFILE === '1' ? path.join(ROOT, 'test-artifacts', 'bench-profile') : undefined;

// Lean at idle, normal at 2 500 rpm, low vacuum, a hose found off: one walk, four answers, a cause.
const LEAN_PATH = [
  { type: 'reading', value: 18, unit: '%' },
  { type: 'reading', value: 3, unit: '%' },
  { type: 'reading', value: 15, unit: 'inHg' },
  { type: 'answer.hose-off' },
];

const say = (m: string) => console.log(`bench: ${m}`);

/** A fresh benchmark database with the schema, the demo shop, one job and WALKS open walks on the lean tree. */
async function prepareDatabase() {
  const { knex, services, tech, leanTreeId } = await freshDemoDatabase(DB);
  try {
    const job = await services.jobs.create(tech.shopId, tech.id, { roNumber: 'BENCH-1', customerName: 'Load Bench', vin: null, vinOverride: false, year: null, make: null, model: null, engine: null, mileage: null, install: [], notes: null } as never);
    // One walk through the service, then copies of its row: identical open walks at the first step.
    const first = await services.walks.start(tech, { jobId: job.id, treeId: leanTreeId });
    const { id: _id, ...row } = await knex('walks').where({ id: first.id }).first();
    await knex.batchInsert('walks', Array.from({ length: WALKS - 1 }, () => ({ ...row })), 500);
    const walkIds: number[] = (await knex('walks').where({ shop_id: tech.shopId, job_id: job.id }).orderBy('id').select('id')).map((r: { id: number }) => r.id);
    return { walkIds, treeId: leanTreeId };
  } finally {
    await knex.destroy();
  }
}

async function signIn(base: string): Promise<string> {
  const email = DEMO_PEOPLE.find((p) => p.role === 'tech')!.email;
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Baywalk-Request': '1' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  return res.headers.getSetCookie().find((c) => c.startsWith('baywalk.sid='))!.split(';')[0];
}

interface Figures {
  name: string;
  rps: number;
  p50: number;
  p99: number;
  requests: number;
  failed: number;
}

const figures = (name: string, r: Result): Figures => ({ name, rps: Math.round(r.requests.average), p50: r.latency.p50, p99: r.latency.p99, requests: r.requests.total, failed: r.non2xx + r.errors + r.timeouts });

/** A short warm-up (not counted), then the measured run; `rate` paces the whole run at that many requests per second. */
async function measure(name: string, opts: Parameters<typeof autocannon>[0], rate?: number): Promise<Figures> {
  const paced = rate ? { overallRate: rate } : {};
  await autocannon({ ...opts, ...paced, connections: CONNECTIONS, duration: 2 });
  const f = figures(name, await autocannon({ ...opts, ...paced, connections: CONNECTIONS, duration: SECONDS }));
  say(`${name.padEnd(28)} ${String(f.rps).padStart(6)} req/s  p50 ${String(f.p50).padStart(4)} ms  p99 ${String(f.p99).padStart(4)} ms  (${f.requests} requests, ${f.failed} failed)`);
  return f;
}

async function main() {
  say(`preparing ${DB} (demo shop, ${WALKS} open walks)`);
  const { walkIds, treeId } = await prepareDatabase();
  const [appPort, barePort] = await Promise.all([freePort(), freePort()]);
  const app = await spawnServer('server/main.ts', appPort, '/api/health', {
    NODE_ENV: process.env.BENCH_NODE_ENV ?? 'production',
    BAYWALK_DB_NAME: DB,
    BAYWALK_PUBLIC_URL: `http://127.0.0.1:${appPort}`,
    BAYWALK_LOG_LEVEL: 'warn',
    BAYWALK_SMTP_HOST: '127.0.0.1',
    BAYWALK_SMTP_PORT: '9',
  }, PROFILE_DIR ? ['--cpu-prof', `--cpu-prof-dir=${PROFILE_DIR}`] : []);
  const bare = await spawnServer('scripts/bench-bare-server.ts', barePort, '/bare', {});
  try {
    const base = `http://127.0.0.1:${appPort}`;
    const cookie = await signIn(base);
    // Every request says what a browser says it accepts (Chromium's header), so each server may compress as it would for the app.
    const browser = { 'accept-encoding': 'gzip, deflate, br, zstd' };
    const headers = { ...browser, cookie, 'content-type': 'application/json', 'x-baywalk-request': '1' };
    // Each connection takes a fresh walk and answers its four steps in order, each with a new client step
    // id; autocannon resets the context after the fourth request, so the next round takes the next walk.
    let next = 0;
    const stepRequests = LEAN_PATH.map((event, i) => ({
      method: 'POST',
      headers,
      setupRequest: (req: object, context: Record<string, unknown>) => {
        if (i === 0) context.walkId = walkIds[next++ % walkIds.length];
        return { ...req, path: `/api/walks/${context.walkId}/steps`, body: JSON.stringify({ stepId: crypto.randomUUID(), event }) };
      },
    }));
    const sampleStep = JSON.stringify({ stepId: crypto.randomUUID(), event: LEAN_PATH[0] });
    // Each of ours beside its yardstick, measured one after the other in the same run.
    const pairs = [
      { key: 'tree', label: 'tree fetch ', target: TARGETS.tree, bare: { name: 'bare Express GET', opts: { url: `http://127.0.0.1:${barePort}/bare`, headers: browser } }, ours: { name: `GET /api/trees/${treeId}`, opts: { url: `${base}/api/trees/${treeId}`, headers: { ...browser, cookie } } } },
      { key: 'step', label: 'step append', target: TARGETS.step, bare: { name: 'bare Express POST (JSON)', opts: { url: `http://127.0.0.1:${barePort}/bare`, method: 'POST' as const, headers: { ...browser, 'content-type': 'application/json' }, body: sampleStep } }, ours: { name: 'POST /api/walks/:id/steps', opts: { url: base, requests: stepRequests } } },
    ].filter((pair) => !ONLY || pair.key === ONLY);
    const runs = async (rate?: number) => {
      const figuresOf: Record<string, { bare: Figures; ours: Figures; ratio: number }> = {};
      for (const pair of pairs) {
        const bareFigures = await measure(pair.bare.name, pair.bare.opts, rate);
        const ours = await measure(pair.ours.name, pair.ours.opts as Parameters<typeof autocannon>[0], rate);
        figuresOf[pair.key] = { bare: bareFigures, ours, ratio: ours.p99 / Math.max(1, bareFigures.p99) };
      }
      return figuresOf;
    };

    say(`saturated: ${CONNECTIONS} connections as fast as they go, ${SECONDS} s per run after a 2 s warm-up`);
    const saturated = await runs();
    say(`paced: ${CONNECTIONS} connections sharing ${RATE} requests/s (autocannon sends them in bursts), ${SECONDS} s per run`);
    const paced = await runs(RATE);
    if (next > walkIds.length) say(`warning: ran out of fresh walks (${next} taken of ${walkIds.length}); raise BENCH_WALKS`);

    for (const [mode, result] of [['saturated', saturated], ['paced', paced]] as const) {
      for (const pair of pairs) {
        const r = result[pair.key].ratio;
        say(`${mode.padEnd(9)} ${pair.label} p99 ${r.toFixed(1)}x ${pair.bare.name.replace('bare Express ', 'bare ')} (target ≤ ${pair.target}x): ${r <= pair.target ? 'met' : 'NOT met'}`);
      }
    }
    const out = path.join(ROOT, 'test-artifacts', 'bench-load.json');
    fs.mkdirSync(path.dirname(out), { recursive: true });
    fs.writeFileSync(out, JSON.stringify({ at: new Date().toISOString(), connections: CONNECTIONS, seconds: SECONDS, rate: RATE, saturated, paced }, null, 2));
    say(`figures written to ${path.relative(ROOT, out)}${PROFILE_DIR ? `; the server's CPU profile goes to ${path.relative(ROOT, PROFILE_DIR)} when it stops` : ''}`);
    if ([saturated, paced].some((r) => Object.values(r).some((f) => f.ours.failed > 0))) {
      say('some requests failed: the figures above do not measure what they claim');
      process.exitCode = 1;
    }
  } finally {
    // The server stops cleanly on SIGTERM, which is also when a profiled one writes its profile.
    app.kill('SIGTERM');
    bare.kill('SIGTERM');
  }
}

main().catch((err) => {
  console.error(`bench: ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
