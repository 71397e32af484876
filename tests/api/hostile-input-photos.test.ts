import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '@/server/config';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { expectSafeAnswer } from './hostile-input-arbitraries';

type Agent = Awaited<ReturnType<typeof signedIn>>;

const SVG_WITH_SCRIPT = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><script>alert(document.cookie)</script></svg>');
const HTML_PAGE = Buffer.from('<!doctype html><html><body><script>fetch("/api/auth/me")</script></body></html>');

/**
 * Path traversal and content-type tricks against the photo routes (and the
 * static site beside them): ids are never paths, the stored type comes from
 * the bytes, and a photo is always served as the image it is.
 */
describe('photo routes against traversal and content-type tricks', () => {
  const photosDir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-hostile-photos-'));
  const t = createTestApp({ photosDir, distDir: loadConfig().distDir });
  let shop: TestShop;
  let tech: Agent;
  let walkId: number;
  let png: Buffer;

  const upload = (bytes: Buffer, filename: string, contentType: string) =>
    tech.post(`/api/walks/${walkId}/photos`).field('step', 'trim-idle').attach('photo', bytes, { filename, contentType });

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Hostile Photos');
    await installStockTrees(t.knex, shop.shopId);
    tech = await signedIn(t.app, shop.people.tech.email);
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
    const job = await tech.post('/api/jobs').send({ roNumber: `HP-${crypto.randomUUID().slice(0, 6)}`, customerName: 'Noor Haddad' });
    walkId = (await tech.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id })).body.walk.id;
    png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#0e7c74' } }).png().toBuffer();
  });
  afterAll(async () => {
    await t.close();
    fs.rmSync(photosDir, { recursive: true, force: true });
  });

  it('refuses scripts, pages and polyglots whatever name and type they claim (415/400 JSON, nothing kept)', async () => {
    const before = await t.knex('photos').where({ shop_id: shop.shopId }).count({ n: '*' });
    const polyglot = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), HTML_PAGE]);
    const tries: Array<[Buffer, string, string]> = [
      [SVG_WITH_SCRIPT, 'photo.svg', 'image/svg+xml'],
      [SVG_WITH_SCRIPT, 'photo.jpg', 'image/jpeg'],
      [HTML_PAGE, 'photo.jpg', 'image/jpeg'],
      [HTML_PAGE, 'index.html', 'text/html'],
      [polyglot, 'photo.jpg', 'image/jpeg'],
      [Buffer.from('GIF89a\x01\x00\x01\x00'), 'photo.gif', 'image/gif'],
    ];
    for (const [bytes, name, type] of tries) {
      const res = await upload(bytes, name, type);
      expectSafeAnswer(res, `${name} as ${type}`);
      expect([400, 415], `${name} as ${type}: ${res.status}`).toContain(res.status);
    }
    expect(await t.knex('photos').where({ shop_id: shop.shopId }).count({ n: '*' })).toEqual(before);
  });

  it('stores a real photo under its own id whatever file name or type the upload claims, and serves it as that image', async () => {
    const res = await upload(png, '../../../../etc/cron.d/evil.html', 'text/html');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const row = await t.knex('photos').where({ id: res.body.photo.id }).first();
    expect(row.storage_key).toBe(`${shop.shopId}/${res.body.photo.id}.png`);
    expect(row.content_type).toBe('image/png');
    const served = await tech.get(res.body.photo.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    expect(served.headers['content-security-policy']).toMatch(/sandbox/);
    expect(served.headers['content-disposition']).toBe(`inline; filename="photo-${res.body.photo.id}.png"`);
    // Nothing was written outside the photo folder.
    expect(fs.readdirSync(photosDir)).toEqual([String(shop.shopId)]);
  });

  it('answers traversal in photo ids with a JSON 404, never a file', async () => {
    const ids = [
      '..%2F..%2F..%2Fetc%2Fpasswd',
      '%2e%2e%2f%2e%2e%2fpackage.json',
      '..%5C..%5Cpackage.json',
      `${shop.shopId}%2F..%2F..%2Fpackage.json`,
      '%00',
      `${crypto.randomUUID()}%00.png`,
      `${crypto.randomUUID().toUpperCase()}`,
    ];
    for (const id of ids) {
      for (const suffix of ['', '/thumb']) {
        const res = await tech.get(`/api/photos/${id}${suffix}`);
        expectSafeAnswer(res, id);
        expect([400, 404], `${id}${suffix}: ${res.status}`).toContain(res.status);
        expect(res.text).not.toMatch(/root:|"name": "baywalk"/);
      }
      const del = await tech.delete(`/api/walks/${walkId}/photos/${id}`);
      expectSafeAnswer(del, `delete ${id}`);
      expect([400, 404]).toContain(del.status);
    }
    // Raw dot segments (not encoded) never leave /api either.
    const raw = await tech.get('/api/photos/../../../package.json');
    expect(raw.text).not.toMatch(/"name": "baywalk"/);
  });

  it('refuses JSON, form and text bodies sent to the upload route, and a second file', async () => {
    const bodies: Array<[string, string]> = [
      ['application/json', JSON.stringify({ step: 'trim-idle', photo: png.toString('base64') })],
      ['application/x-www-form-urlencoded', 'step=trim-idle&photo=abc'],
      ['text/plain', 'hello'],
      ['multipart/form-data', '--x\r\n\r\n--x--'],
      ['multipart/form-data; boundary=zz', '--zz\r\nContent-Disposition: form-data; name="photo"; filename="a.jpg"\r\n\r\n'],
    ];
    for (const [type, body] of bodies) {
      const res = await tech.post(`/api/walks/${walkId}/photos`).set('Content-Type', type).send(body);
      expectSafeAnswer(res, type);
      expect(res.status, `${type}: ${res.status}`).toBeGreaterThanOrEqual(400);
    }
    const two = await tech
      .post(`/api/walks/${walkId}/photos`)
      .field('step', 'trim-idle')
      .attach('photo', png, 'a.png')
      .attach('photo', png, 'b.png');
    expectSafeAnswer(two, 'two files');
    expect(two.status).toBe(400);
  });

  it('the static site never serves files from outside the web build', async () => {
    const anon = agent(t.app);
    for (const p of ['/..%2f..%2fpackage.json', '/assets/..%2f..%2f..%2fpackage.json', '/_expo/%2e%2e/%2e%2e/%2e%2e/.data/run/socket-path', '/%2e%2e/server/config.ts']) {
      const res = await anon.get(p);
      expect(res.status, p).toBeLessThan(500);
      expect(res.text, p).not.toMatch(/"name": "baywalk"|loadConfig|baywalk-local/);
    }
  });
});
