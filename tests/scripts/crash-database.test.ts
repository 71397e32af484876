/// <reference types="node" />
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import { Client, freePort, freshDatabase, knexFor, LEAN_PATH, ROOT, shopWithTrees, sleep, progress, startServer, startWalks, technician, testDbName, verifyWalks, type ServerProcess, type TechLog } from './crash-support';

const TECHS = 20;
const OUTAGES = 2;
const WALKS_PER_TECH = 8;

/**
 * The MariaDB server is killed with SIGKILL while 20 technicians append
 * steps, and started again a few seconds later, twice. Meanwhile the API
 * answers 503 with a message a person can act on; afterwards the same server
 * process recovers by itself, and nothing acknowledged is lost or doubled.
 * Runs on a PRIVATE MariaDB (own data folder and port) so the shared one is
 * never touched.
 */
describe('database killed with SIGKILL under load', () => {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-crashdb-'));
  const dbName = testDbName('crashdb');
  let env: Record<string, string>;
  let knex: Knex;
  let server: ServerProcess | undefined;

  const dbScript = (script: string) => {
    const res = spawnSync('bash', [path.join(ROOT, 'scripts', script)], { env: { ...process.env, ...env, BAYWALK_DB_NAME: dbName }, encoding: 'utf8', timeout: 60_000 });
    if (res.status !== 0) throw new Error(`${script}: ${res.stdout}${res.stderr}`);
  };

  beforeAll(async () => {
    env = { BAYWALK_DATA_DIR: dataDir, BAYWALK_DB_PORT: String(await freePort()) };
    freshDatabase(dbName, env);
    knex = knexFor(dbName, Number(env.BAYWALK_DB_PORT));
  }, 120_000);
  afterAll(async () => {
    await server?.kill('SIGKILL');
    await knex?.destroy();
    if (env) spawnSync('bash', [path.join(ROOT, 'scripts', 'db-down.sh')], { env: { ...process.env, ...env }, timeout: 30_000 });
    fs.rmSync(dataDir, { recursive: true, force: true });
  }, 60_000);

  it(`answers 503 while the database is away and recovers by itself, ${OUTAGES} times, losing nothing`, async () => {
    const { shop, treeId } = await shopWithTrees(knex, 'CrashDb');
    server = await startServer({ port: await freePort(), dbName, dbPort: Number(env.BAYWALK_DB_PORT), env });
    const emails = [shop.people.tech.email, shop.people.lead.email, shop.people.owner.email];
    const clients = await Promise.all(Array.from({ length: TECHS }, (_, i) => new Client(server!.url).signIn(emails[i % emails.length])));
    const walkIds = await startWalks(clients[0], treeId, TECHS * WALKS_PER_TECH);
    // A walk of its own for probing during the outage (its refused steps are not counted).
    const [probeWalk] = await startWalks(clients[0], treeId, 1);
    const probe = clients[0];

    const log: TechLog = { acks: [], unavailable: [], networkErrors: 0, unexpected: [] };
    let stopping = false;
    const techs = clients.map((c, i) => technician(c, walkIds.slice(i * WALKS_PER_TECH, (i + 1) * WALKS_PER_TECH), () => stopping, log));

    for (let k = 0; k < OUTAGES; k++) {
      await progress(log, 25, () => server!.output());
      const pid = Number(fs.readFileSync(path.join(dataDir, 'run', 'mariadb.pid'), 'utf8'));
      process.kill(pid, 'SIGKILL');

      // While it is away: health says so, and a step is refused with 503 and a plain message.
      const health = await fetch(`${server.url}/api/health`);
      expect(health.status).toBe(503);
      expect((await health.json()).database.ok).toBe(false);
      const step = await probe.send('POST', `/api/walks/${probeWalk}/steps`, { stepId: crypto.randomUUID(), event: LEAN_PATH[0] });
      expect(step.status, JSON.stringify(step.body)).toBe(503);
      expect(step.body.error).toMatchObject({ code: 'database_unavailable' });
      expect(step.body.error.message).toMatch(/database is not answering right now.*saved work is safe/i);
      const read = await probe.send('GET', `/api/walks/${probeWalk}`);
      expect(read.status).toBe(503);
      await sleep(1500);

      dbScript('db-up.sh');
      // The same server process finds the database again on its own.
      const until = Date.now() + 30_000;
      while ((await fetch(`${server.url}/api/health`)).status !== 200) {
        expect(Date.now(), server.output()).toBeLessThan(until);
        await sleep(100);
      }
      expect(server.proc.exitCode).toBeNull();
    }
    await progress(log, 25, () => server!.output());
    stopping = true;
    await Promise.all(techs);

    expect(log.unexpected, JSON.stringify(log.unexpected.slice(0, 3))).toEqual([]);
    // The technicians themselves met the outage, always as a JSON 503 with a message.
    expect(log.unavailable.length).toBeGreaterThan(0);
    for (const r of log.unavailable) expect(r.body.error.message).toMatch(/database is not answering|too busy to save this just now/);
    expect(await verifyWalks(knex, shop, walkIds, log.acks)).toEqual([]);
    expect(await knex('walk_steps').where({ walk_id: probeWalk }).count({ n: '*' })).toEqual([{ n: 0 }]);
  });
});
