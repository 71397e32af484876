/// <reference types="node" />
// Shared by the on-demand measurement scripts (bench-load.ts, lighthouse.ts):
// a fresh database with the demo shop, and real server processes on free ports.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import type { Knex } from 'knex';
import { loadConfig, type Config } from '@/server/config';
import { openDatabase } from '@/server/db';
import { createServices, type Services } from '@/server/services';
import { seedDemoIfEmpty } from '@/server/seeds/demo-seed';
import { DEMO_PEOPLE } from '@/server/seeds/demo-people';

export const ROOT = path.resolve(__dirname, '..');
export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Runs a command in the repository; throws with its output when it fails. */
export function run(cmd: string, args: string[], env: Record<string, string> = {}) {
  const res = spawnSync(cmd, args, { cwd: ROOT, env: { ...process.env, ...env }, encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`${cmd} ${args.join(' ')}: ${res.stdout}${res.stderr}`);
}

/** A loopback port nothing listens on right now. */
export function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** Starts a TypeScript entry point as its own node process and waits for an HTTP answer at `probe`. */
export async function spawnServer(entry: string, port: number, probe: string, env: Record<string, string>, nodeArgs: string[] = []): Promise<ChildProcess> {
  let out = '';
  const proc = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', entry], { cwd: ROOT, env: { ...process.env, ...env, PORT: String(port) }, stdio: ['ignore', 'pipe', 'pipe'] });
  proc.stdout!.on('data', (d) => (out += d));
  proc.stderr!.on('data', (d) => (out += d));
  for (let i = 0; i < 600; i++) {
    if (proc.exitCode !== null) throw new Error(`${entry} exited: ${out}`);
    try {
      await fetch(`http://127.0.0.1:${port}${probe}`);
      return proc;
    } catch {
      await sleep(100);
    }
  }
  throw new Error(`${entry} did not answer: ${out}`);
}

export interface DemoDatabase {
  knex: Knex;
  config: Config;
  services: Services;
  /** The demo technician, as services expect an actor. */
  tech: { id: number; shopId: number };
  /** The stock lean-after-intake tree of the demo shop. */
  leanTreeId: number;
}

/**
 * Drops and recreates `db` on the private MariaDB, migrates it and loads the
 * demo shop. The caller destroys `knex` when done.
 */
export async function freshDemoDatabase(db: string): Promise<DemoDatabase> {
  run('bash', ['scripts/db-up.sh', db]);
  const sock = fs.readFileSync(path.join(loadConfig().dataDir, 'run', 'socket-path'), 'utf8').trim();
  run('mariadb', ['--no-defaults', '-S', sock, '-uroot', '-e', `DROP DATABASE IF EXISTS \`${db}\`; CREATE DATABASE \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`]);
  run(path.join(ROOT, 'node_modules/.bin/tsx'), ['scripts/migrate.ts'], { BAYWALK_DB_NAME: db });
  const config = { ...loadConfig(), db: { ...loadConfig().db, database: db } };
  const knex = openDatabase(config.db);
  await seedDemoIfEmpty(knex);
  const tech = await knex('users').where({ email: DEMO_PEOPLE.find((p) => p.role === 'tech')!.email }).first('id', 'shop_id');
  const tree = await knex('trees').where({ shop_id: tech.shop_id, slug: 'lean-after-intake-manifold' }).first('id');
  return { knex, config, services: createServices({ knex, config }), tech: { id: tech.id, shopId: tech.shop_id }, leanTreeId: tree.id };
}
