/// <reference types="node" />
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { Client, freePort, freshDatabase, knexFor, shopWithTrees, sleep, progress, startServer, startWalks, technician, testDbName, verifyWalks, type ServerProcess, type TechLog } from './crash-support';

const TECHS = 20;
const KILLS = 4;
const WALKS_PER_TECH = 12;

/**
 * The server process is killed with SIGKILL while 20 technicians append
 * steps, and restarted, several times. Clients retry a lost answer with the
 * same step id (as the app does). Afterwards every acknowledged step is stored
 * exactly once and every walk replays cleanly through the engine.
 */
describe('server killed with SIGKILL under load', () => {
  const dbName = testDbName('crash');
  let db: ReturnType<typeof freshDatabase>;
  let knex: Knex;
  let server: ServerProcess | undefined;

  beforeAll(() => {
    db = freshDatabase(dbName);
    knex = knexFor(dbName);
  }, 120_000);
  afterAll(async () => {
    await server?.kill('SIGKILL');
    await knex?.destroy();
    db?.drop();
  }, 60_000);

  it(`loses and doubles nothing across ${KILLS} kills`, async () => {
    const { shop, treeId } = await shopWithTrees(knex, 'Crash');
    const port = await freePort();
    server = await startServer({ port, dbName });
    const emails = [shop.people.tech.email, shop.people.lead.email, shop.people.owner.email];
    const clients = await Promise.all(Array.from({ length: TECHS }, (_, i) => new Client(server!.url).signIn(emails[i % emails.length])));
    const walkIds = await startWalks(clients[0], treeId, TECHS * WALKS_PER_TECH);

    const log: TechLog = { acks: [], unavailable: [], networkErrors: 0, unexpected: [] };
    let stopping = false;
    const techs = clients.map((c, i) => technician(c, walkIds.slice(i * WALKS_PER_TECH, (i + 1) * WALKS_PER_TECH), () => stopping, log));

    const ackedAtKill: number[] = [];
    for (let k = 0; k < KILLS; k++) {
      // Let the technicians get going after each (re)start, then kill mid-traffic.
      await progress(log, 25, () => server!.output());
      await sleep(Math.random() * 150);
      ackedAtKill.push(log.acks.length);
      await server.kill('SIGKILL');
      await sleep(200);
      // Same port: the clients keep their address and their session cookies.
      server = await startServer({ port, dbName });
    }
    await progress(log, 25, () => server!.output());
    stopping = true;
    await Promise.all(techs);

    expect(log.unexpected, JSON.stringify(log.unexpected.slice(0, 3))).toEqual([]);
    // Each kill happened while steps were being acknowledged, and clients saw the connections drop.
    expect(ackedAtKill.every((n, i) => n > (ackedAtKill[i - 1] ?? 0))).toBe(true);
    expect(log.networkErrors).toBeGreaterThan(0);
    expect(log.acks.length).toBeGreaterThan(KILLS * 25);
    expect(await verifyWalks(knex, shop, walkIds, log.acks)).toEqual([]);

    // The restarted server serves the walks it did not see being written.
    const detail = await clients[1].send('GET', `/api/walks/${log.acks[0].walkId}`);
    expect(detail.status).toBe(200);
    expect(detail.body.walk.currentStep).toBe(detail.body.position.stepId);
  });
});
