/// <reference types="node" />
// Helpers for the fault tests: real server processes, private or per-test
// databases, simulated technicians over HTTP and the checks that nothing was
// lost or doubled.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import type { Knex } from 'knex';
import { loadConfig } from '@/server/config';
import { openDatabase } from '@/server/db';
import { installStockTrees } from '@/server/services/tree-stock';
import { liveEvents } from '@/server/services/walk-records';
import type { WalkStepRow } from '@/server/repositories/walk-repository';
import { parseTree, replayWalk, type WalkEvent } from '@/trees/engine';
import { createShopWithPeople, TEST_PASSWORD, type TestShop } from '../support/people';

export const ROOT = path.resolve(__dirname, '../..');

// Lean at idle, normal at 2 500 rpm, low vacuum, a hose found off: a cause in four answers.
export const LEAN_PATH: WalkEvent[] = [
  { type: 'reading', value: 18, unit: '%' },
  { type: 'reading', value: 3, unit: '%' },
  { type: 'reading', value: 15, unit: 'inHg' },
  { type: 'answer.hose-off' },
];

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** A free TCP port on loopback. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });
}

/** A database name for one fault test, derived from the suite's test database so it always contains "test". */
export function testDbName(suffix: string): string {
  const base = process.env.BAYWALK_DB_NAME ?? 'baywalk_test';
  const name = `${base}_${suffix}`;
  if (!name.includes('test')) throw new Error(`refusing to use "${name}": test database names contain "test"`);
  return name;
}

function runScript(args: string[], env: Record<string, string | undefined>, timeout = 90_000) {
  const res = spawnSync(args[0], args.slice(1), { cwd: ROOT, env: { ...process.env, ...env }, encoding: 'utf8', timeout });
  if (res.status !== 0) throw new Error(`${args.join(' ')} failed (${res.status}): ${res.stdout}${res.stderr}`);
  return `${res.stdout}${res.stderr}`;
}

/**
 * A fresh database on a MariaDB started by scripts/db-up.sh (the shared one by
 * default, or a private one when env names another data dir and port), with
 * the schema applied. The shared server is never stopped here.
 */
export function freshDatabase(name: string, env: Record<string, string> = {}) {
  const dataDir = env.BAYWALK_DATA_DIR ?? process.env.BAYWALK_DATA_DIR ?? path.join(ROOT, '.data');
  runScript(['bash', 'scripts/db-up.sh'], { ...env, BAYWALK_DB_NAME: name });
  const sock = fs.readFileSync(path.join(dataDir, 'run', 'socket-path'), 'utf8').trim();
  runScript(['mariadb', '--no-defaults', '-S', sock, '-uroot', '-e', `DROP DATABASE IF EXISTS \`${name}\`; CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`], env);
  runScript([path.join(ROOT, 'node_modules/.bin/tsx'), 'scripts/migrate.ts'], { ...env, BAYWALK_DB_NAME: name });
  return { dataDir, sock, drop: () => runScript(['mariadb', '--no-defaults', '-S', sock, '-uroot', '-e', `DROP DATABASE IF EXISTS \`${name}\`;`], env) };
}

/** A Knex pool on a named database (port from env or the default). */
export function knexFor(name: string, port?: number): Knex {
  const db = loadConfig().db;
  return openDatabase({ ...db, database: name, port: port ?? db.port });
}

/** A shop with one person per role and the stock library, made directly in the database. */
export async function shopWithTrees(knex: Knex, label: string) {
  const shop = await createShopWithPeople(knex, label);
  await installStockTrees(knex, shop.shopId);
  const tree = await knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
  return { shop, treeId: tree.id as number };
}

/** A job and `count` walks on a tree, started through the API as the app does. */
export async function startWalks(client: Client, treeId: number, count: number): Promise<number[]> {
  const job = await client.send('POST', '/api/jobs', { roNumber: `F-${crypto.randomUUID().slice(0, 8)}`, customerName: 'Fault Test' });
  if (job.status !== 201) throw new Error(`job: ${job.status} ${JSON.stringify(job.body)}`);
  const ids: number[] = [];
  for (let i = 0; i < count; i += 10) {
    const batch = await Promise.all(
      Array.from({ length: Math.min(10, count - i) }, () => client.send('POST', '/api/walks', { jobId: job.body.job.id, treeId })),
    );
    for (const r of batch) {
      if (r.status !== 201) throw new Error(`walk: ${r.status} ${JSON.stringify(r.body)}`);
      ids.push(r.body.walk.id);
    }
  }
  return ids;
}

/** One server process: `node --import tsx server/main.ts`, so a signal reaches the server itself. */
export interface ServerProcess {
  url: string;
  port: number;
  proc: ChildProcess;
  output: () => string;
  kill: (signal: NodeJS.Signals) => Promise<void>;
}

/** Starts server/main.ts on a port with a database and waits until it answers. */
export async function startServer(opts: { port: number; dbName: string; dbPort?: number; env?: Record<string, string> }): Promise<ServerProcess> {
  let out = '';
  const proc = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(opts.port),
      BAYWALK_DB_NAME: opts.dbName,
      BAYWALK_DB_PORT: String(opts.dbPort ?? loadConfig().db.port),
      // A real SMTP host setting keeps the server from starting its own mail catcher.
      BAYWALK_SMTP_HOST: '127.0.0.1',
      BAYWALK_SMTP_PORT: '9',
      BAYWALK_LOG_LEVEL: 'warn',
      ...opts.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  proc.stdout!.on('data', (d) => (out += d));
  proc.stderr!.on('data', (d) => (out += d));
  const url = `http://127.0.0.1:${opts.port}`;
  const until = Date.now() + 60_000;
  for (;;) {
    if (proc.exitCode !== null) throw new Error(`server exited with ${proc.exitCode}: ${out}`);
    try {
      await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(2000) });
      break;
    } catch {
      if (Date.now() > until) throw new Error(`server did not answer within 60 s: ${out}`);
      await sleep(100);
    }
  }
  return {
    url,
    port: opts.port,
    proc,
    output: () => out,
    kill: (signal) =>
      new Promise<void>((resolve) => {
        if (proc.exitCode !== null || proc.signalCode !== null) return resolve();
        proc.once('exit', () => resolve());
        proc.kill(signal);
      }),
  };
}

/** A signed-in browser-like client: keeps the session cookie and sends the CSRF header. */
export class Client {
  cookie = '';
  constructor(public base: string) {}

  async signIn(email: string, password = TEST_PASSWORD) {
    const res = await this.send('POST', '/api/auth/sign-in', { email, password });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
    return this;
  }

  /** One request; throws on network errors (connection refused or reset). */
  async send(method: string, url: string, body?: unknown): Promise<{ status: number; body: any }> {
    const res = await fetch(`${this.base}${url}`, {
      method,
      headers: { 'X-Baywalk-Request': '1', 'Content-Type': 'application/json', ...(this.cookie ? { Cookie: this.cookie } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: AbortSignal.timeout(30_000),
    });
    const set = res.headers.getSetCookie().find((c) => c.startsWith('baywalk.sid='));
    if (set) this.cookie = set.split(';')[0];
    const text = await res.text();
    let parsed: unknown = text;
    try {
      parsed = JSON.parse(text);
    } catch {
      // not JSON: kept as text so the test can say what arrived
    }
    return { status: res.status, body: parsed };
  }
}

export interface Ack {
  walkId: number;
  stepId: string;
  seq: number;
}

/** What the technicians saw: acknowledged steps, and every refusal while the database was away. */
export interface TechLog {
  acks: Ack[];
  unavailable: Array<{ status: number; body: any }>;
  networkErrors: number;
  unexpected: Array<{ status: number; body: any }>;
}

/**
 * One technician: walks their walks along LEAN_PATH, one answer at a time.
 * A lost answer (connection refused or reset, or a 503) is retried with the
 * SAME step id until the server acknowledges it, as the app does.
 */
export async function technician(client: Client, walks: number[], stop: () => boolean, log: TechLog) {
  for (const walkId of walks) {
    for (const event of LEAN_PATH) {
      if (stop()) return;
      const stepId = crypto.randomUUID();
      for (let attempt = 0; ; attempt++) {
        let res;
        try {
          res = await client.send('POST', `/api/walks/${walkId}/steps`, { stepId, event });
        } catch {
          log.networkErrors++;
          await sleep(50 + Math.random() * 100);
          continue;
        }
        if (res.status === 200) {
          log.acks.push({ walkId, stepId, seq: res.body.step.seq });
          break;
        }
        if (res.status === 503) {
          log.unavailable.push(res);
          await sleep(100 + Math.random() * 200);
          continue;
        }
        log.unexpected.push(res);
        return;
      }
    }
  }
}

/** The server's own error reports (unhandled errors first), short enough for a failure message. */
export function serverErrors(output: string): string {
  const lines = output.split('\n');
  const unhandled = lines.filter((l) => l.includes('unhandled error')).map((l) => l.slice(0, 1200));
  return [...unhandled.slice(0, 3), ...lines.slice(-10)].join('\n');
}

/** Waits until the technicians have had `count` more steps acknowledged; fails with what they saw after 45 s. */
export async function progress(log: TechLog, count: number, output: () => string) {
  const from = log.acks.length;
  const until = Date.now() + 45_000;
  while (log.acks.length < from + count) {
    if (Date.now() > until) {
      throw new Error(
        `only ${log.acks.length - from} of ${count} steps acknowledged in 45 s; ${log.unavailable.length} answers 503, ${log.networkErrors} network errors, ` +
          `unexpected: ${JSON.stringify(log.unexpected.slice(0, 2))}; server said: ${serverErrors(output())}`,
      );
    }
    await sleep(20);
  }
}

/**
 * The checks after the faults: every acknowledged step is stored exactly once
 * with the sequence number it was acknowledged with, nothing unacknowledged
 * was stored, sequences have no gaps, and every walk replays cleanly through
 * the engine to the position and count the walk row records.
 */
export async function verifyWalks(knex: Knex, shop: TestShop, walkIds: number[], acks: Ack[]) {
  const problems: string[] = [];
  const rows: WalkStepRow[] = (await knex('walk_steps').whereIn('walk_id', walkIds).orderBy(['walk_id', 'seq'])).map((r: WalkStepRow) => ({
    ...r,
    event: typeof r.event === 'string' ? JSON.parse(r.event) : r.event,
  }));
  const byId = new Map<string, WalkStepRow[]>();
  for (const r of rows) byId.set(r.id, [...(byId.get(r.id) ?? []), r]);
  for (const a of acks) {
    const found = byId.get(a.stepId) ?? [];
    if (found.length !== 1) problems.push(`acknowledged step ${a.stepId} stored ${found.length} times`);
    else if (found[0].walk_id !== a.walkId || found[0].seq !== a.seq) problems.push(`step ${a.stepId} stored at walk ${found[0].walk_id} seq ${found[0].seq}, acknowledged as ${a.walkId}/${a.seq}`);
  }
  if (rows.length !== acks.length) problems.push(`${rows.length} step records stored, ${acks.length} acknowledged`);

  const walks = await knex('walks').whereIn('id', walkIds).select('*');
  const docs = new Map<number, ReturnType<typeof parseTree>>();
  for (const w of walks) {
    if (w.shop_id !== shop.shopId) problems.push(`walk ${w.id} changed shop`);
    const steps = rows.filter((r) => r.walk_id === w.id);
    const seqs = steps.map((s) => s.seq);
    if (seqs.some((s, i) => s !== i + 1)) problems.push(`walk ${w.id} has sequence ${seqs.join(',')}`);
    if (!docs.has(w.tree_version_id)) {
      const v = await knex('tree_versions').where({ id: w.tree_version_id }).first('doc');
      docs.set(w.tree_version_id, parseTree(typeof v.doc === 'string' ? JSON.parse(v.doc) : v.doc));
    }
    const parsed = docs.get(w.tree_version_id)!;
    if (!parsed.ok) {
      problems.push(`walk ${w.id}: its tree no longer parses`);
      continue;
    }
    try {
      const events = liveEvents(steps);
      const pos = replayWalk(parsed.doc, events, { altitudeM: w.altitude_m });
      if (pos.stepId !== w.current_step) problems.push(`walk ${w.id} says ${w.current_step}, replay says ${pos.stepId}`);
      if (events.length !== w.step_count) problems.push(`walk ${w.id} counts ${w.step_count} steps, replay has ${events.length}`);
    } catch (err) {
      problems.push(`walk ${w.id} does not replay: ${(err as Error).message}`);
    }
  }
  return problems;
}
