/// <reference types="node" />
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IDENTITY_CACHE_MS } from '@/server/auth/identity-cache';
import crypto from 'node:crypto';
import type { Knex } from 'knex';
import { Client, freePort, freshDatabase, knexFor, LEAN_PATH, shopWithTrees, startServer, startWalks, testDbName, verifyWalks, type Ack, type ServerProcess } from './crash-support';

/**
 * The way to scale out: two server processes on different ports share one
 * MariaDB (sessions and data live there, nothing in process memory between
 * requests). A walk started through one continues through the other with the
 * same sign-in cookie, answers alternate between them, and a sign-out through
 * one ends the session on both.
 */
describe('two servers, one database', () => {
  const dbName = testDbName('two');
  let db: ReturnType<typeof freshDatabase>;
  let knex: Knex;
  const servers: ServerProcess[] = [];

  beforeAll(async () => {
    db = freshDatabase(dbName);
    knex = knexFor(dbName);
    const [a, b] = await Promise.all([freePort(), freePort()]);
    servers.push(...(await Promise.all([startServer({ port: a, dbName }), startServer({ port: b, dbName })])));
  }, 120_000);
  afterAll(async () => {
    await Promise.all(servers.map((s) => s.kill('SIGTERM')));
    await knex?.destroy();
    db?.drop();
  }, 60_000);

  it('continues a walk through the other server with the same sign-in', async () => {
    const { shop, treeId } = await shopWithTrees(knex, 'TwoServers');
    const [one, two] = servers;
    expect(one.proc.pid).not.toBe(two.proc.pid);
    const viaOne = await new Client(one.url).signIn(shop.people.tech.email);
    // The same cookie, sent to the other process.
    const viaTwo = new Client(two.url);
    viaTwo.cookie = viaOne.cookie;
    expect((await viaTwo.send('GET', '/api/auth/me')).body.user.email).toBe(shop.people.tech.email);

    const [walkId] = await startWalks(viaOne, treeId, 1);
    const acks: Ack[] = [];
    for (const [i, event] of LEAN_PATH.entries()) {
      const client = i % 2 === 0 ? viaTwo : viaOne;
      const stepId = crypto.randomUUID();
      const res = await client.send('POST', `/api/walks/${walkId}/steps`, { stepId, event });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      acks.push({ walkId, stepId, seq: res.body.step.seq });
      // A retry through the OTHER server gets the same record, not a second one.
      const retry = await (client === viaOne ? viaTwo : viaOne).send('POST', `/api/walks/${walkId}/steps`, { stepId, event });
      expect(retry.status).toBe(200);
      expect(retry.body.step).toEqual(res.body.step);
    }
    const [a, b] = await Promise.all([viaOne.send('GET', `/api/walks/${walkId}`), viaTwo.send('GET', `/api/walks/${walkId}`)]);
    expect(a.body.position).toEqual(b.body.position);
    expect(a.body.position).toMatchObject({ stepId: 'vacuum-hose-off-or-split', final: true, stepsTaken: 4 });
    expect(a.body.history.map((h: { by: { name: string } }) => h.by.name)).toEqual(Array(4).fill(shop.people.tech.name));
    expect(await verifyWalks(knex, shop, [walkId], acks)).toEqual([]);

    // Signing out through one server ends the session for both: at once on that one, and on the other
    // once its short-lived copy of the session runs out (IDENTITY_CACHE_MS, server/auth/identity-cache.ts).
    expect((await viaTwo.send('POST', '/api/auth/sign-out')).status).toBe(200);
    expect((await viaTwo.send('GET', `/api/walks/${walkId}`)).status).toBe(401);
    await new Promise((r) => setTimeout(r, IDENTITY_CACHE_MS + 50));
    const after = new Client(one.url);
    after.cookie = viaOne.cookie;
    expect((await after.send('GET', `/api/walks/${walkId}`)).status).toBe(401);
  });
});
