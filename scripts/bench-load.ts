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
  });
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
    const runs = async (rate?: number) => ({
      bareGet: await measure('bare Express GET', { url: `http://127.0.0.1:${barePort}/bare`, headers: browser }, rate),
      tree: await measure(`GET /api/trees/${treeId}`, { url: `${base}/api/trees/${treeId}`, headers: { ...browser, cookie } }, rate),
      barePost: await measure('bare Express POST (JSON)', { url: `http://127.0.0.1:${barePort}/bare`, method: 'POST', headers: { ...browser, 'content-type': 'application/json' }, body: sampleStep }, rate),
      step: await measure('POST /api/walks/:id/steps', { url: base, requests: stepRequests }, rate),
    });

    say(`saturated: ${CONNECTIONS} connections as fast as they go, ${SECONDS} s per run after a 2 s warm-up`);
    const saturated = await runs();
    say(`paced: ${CONNECTIONS} connections sharing ${RATE} requests/s (latency without queueing), ${SECONDS} s per run`);
    const paced = await runs(RATE);
    if (next > walkIds.length) say(`warning: ran out of fresh walks (${next} taken of ${walkIds.length}); raise BENCH_WALKS`);

    const ratio = (r: Awaited<ReturnType<typeof runs>>) => ({ step: r.step.p99 / Math.max(1, r.barePost.p99), tree: r.tree.p99 / Math.max(1, r.bareGet.p99) });
    const ratios = { saturated: ratio(saturated), paced: ratio(paced) };
    for (const mode of ['saturated', 'paced'] as const) {
      const r = ratios[mode];
      say(`${mode.padEnd(9)} step append p99 ${r.step.toFixed(1)}x bare POST (target ≤ ${TARGETS.step}x): ${r.step <= TARGETS.step ? 'met' : 'NOT met'}`);
      say(`${mode.padEnd(9)} tree fetch  p99 ${r.tree.toFixed(1)}x bare GET  (target ≤ ${TARGETS.tree}x): ${r.tree <= TARGETS.tree ? 'met' : 'NOT met'}`);
    }
    const out = path.join(ROOT, 'test-artifacts', 'bench-load.json');
    fs.mkdirSync(path.dirname(out), { recursive: true });
    fs.writeFileSync(out, JSON.stringify({ at: new Date().toISOString(), connections: CONNECTIONS, seconds: SECONDS, rate: RATE, saturated, paced, ratios }, null, 2));
    say(`figures written to ${path.relative(ROOT, out)}`);
    if ([saturated, paced].some((r) => r.tree.failed + r.step.failed > 0)) {
      say('some requests failed: the figures above do not measure what they claim');
      process.exitCode = 1;
    }
  } finally {
    app.kill('SIGTERM');
    bare.kill('SIGTERM');
  }
}

main().catch((err) => {
  console.error(`bench: ${err instanceof Error ? err.message : err}`);
  process.exit(1);
});
