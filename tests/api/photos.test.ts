import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { gpsLatitude } from '../support/exif-gps';

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** A real JPEG carrying a GPS position (51° 30' 36" N) and a camera make in its EXIF. */
async function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 800, height: 600, channels: 3, background: '#3a6b5c' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'BayCam', Model: 'Test 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 36/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 39/1' },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A PNG chunk with its CRC. */
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** A tiny valid-looking PNG that declares 60 000 × 60 000 pixels (a decompression bomb). */
function pngBomb(): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(60_000, 0);
  ihdr.writeUInt32BE(60_000, 4);
  ihdr.set([8, 0, 0, 0, 0], 8); // 8-bit greyscale
  const idat = zlib.deflateSync(Buffer.alloc(60_001 * 4)); // a few rows of zeros; the rest would decode from nothing
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', idat), chunk('IEND', Buffer.alloc(0))]);
}

function filesUnder(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => path.join(d.parentPath, d.name));
}

describe('photos API', () => {
  const photosDir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-photos-'));
  const t = createTestApp({ photosDir });
  let shop: TestShop;
  let other: TestShop;
  let tech: Agent;
  let walkId: number;

  async function newWalk(a: Agent): Promise<number> {
    const tree = await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id');
    const job = await a.post('/api/jobs').send({ roNumber: `P-${crypto.randomUUID().slice(0, 8)}`, customerName: 'Sam Ortega' });
    const walk = await a.post('/api/walks').send({ jobId: job.body.job.id, treeId: tree.id });
    expect(walk.status).toBe(201);
    return walk.body.walk.id;
  }
  const upload = (a: Agent, id: number, bytes: Buffer, filename = 'photo.jpg', step = 'trim-idle') =>
    a.post(`/api/walks/${id}/photos`).field('step', step).attach('photo', bytes, { filename, contentType: 'image/jpeg' });

  /** Runs a refused upload and proves nothing was kept, on disk or in the database. */
  async function refusedLeavesNothing(send: () => Promise<request.Response>) {
    const filesBefore = filesUnder(photosDir).length;
    const rowsBefore = await t.knex('photos').where({ shop_id: shop.shopId }).count({ n: '*' });
    const res = await send();
    expect(filesUnder(photosDir)).toHaveLength(filesBefore);
    expect(filesUnder(photosDir).filter((f) => f.endsWith('.part'))).toEqual([]);
    expect(await t.knex('photos').where({ shop_id: shop.shopId }).count({ n: '*' })).toEqual(rowsBefore);
    return res;
  }

  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Photos');
    other = await createShopWithPeople(t.knex, 'Others');
    await installStockTrees(t.knex, shop.shopId);
    tech = await signedIn(t.app, shop.people.tech.email);
    walkId = await newWalk(tech);
  });
  afterAll(async () => {
    await t.close();
    fs.rmSync(photosDir, { recursive: true, force: true });
  });

  it('strips GPS and all other metadata, turns the photo upright, and serves it with the right type', async () => {
    const original = await jpegWithGps();
    expect(gpsLatitude((await sharp(original).metadata()).exif)).toBeCloseTo(51.51, 2); // the test photo really has a position
    const res = await upload(tech, walkId, original);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.photo).toMatchObject({ step: 'trim-idle', atSeq: 0, width: 600, height: 800 });
    expect(res.body.photo.url).toBe(`/api/photos/${res.body.photo.id}`);

    const served = await tech.get(res.body.photo.url).buffer(true).parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => cb(null, Buffer.concat(parts)));
    });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    const body = served.body as Buffer;
    const meta = await sharp(body).metadata();
    expect(meta.exif).toBeUndefined();
    expect(gpsLatitude(meta.exif)).toBeNull();
    expect(body.includes(Buffer.from('BayCam'))).toBe(false);
    expect([meta.width, meta.height]).toEqual([600, 800]);

    const thumb = await tech.get(res.body.photo.thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/jpeg');
    expect((await sharp(thumb.body as Buffer).metadata()).height).toBe(320);

    const walk = await tech.get(`/api/walks/${walkId}`);
    expect(walk.body.photos.map((p: { id: string }) => p.id)).toContain(res.body.photo.id);
    // The files on disk are named by the server, never by the upload.
    expect(filesUnder(photosDir).every((f) => /\/\d+\/[0-9a-f-]{36}(-thumb)?\.jpg$/.test(f))).toBe(true);
  });

  it('refuses a text file renamed .jpg, with a clear message, leaving nothing behind', async () => {
    const res = await refusedLeavesNothing(() => upload(tech, walkId, Buffer.from('just some notes, not a picture\n'.repeat(20)), 'notes.jpg'));
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/not a JPEG, PNG or WebP photo/);
  });

  it('refuses a file over 10 MB, leaving nothing behind', async () => {
    const big = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), crypto.randomBytes(10 * 1024 * 1024)]);
    const res = await refusedLeavesNothing(() => upload(tech, walkId, big));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 10 MB/);
  });

  it('refuses a decompression bomb before decoding it, leaving nothing behind', async () => {
    const bomb = pngBomb();
    expect(bomb.length).toBeLessThan(10_000);
    const res = await refusedLeavesNothing(() => upload(tech, walkId, bomb, 'small.png'));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/60000 × 60000 pixels/);
  });

  it('refuses a damaged image, a missing file and an unknown step, leaving nothing behind', async () => {
    const good = await jpegWithGps();
    const damaged = await refusedLeavesNothing(() => upload(tech, walkId, good.subarray(0, 300)));
    expect(damaged.status).toBe(400);
    expect(damaged.body.error.message).toMatch(/could not be read/);
    const none = await refusedLeavesNothing(() => tech.post(`/api/walks/${walkId}/photos`).field('step', 'trim-idle'));
    expect(none.status).toBe(400);
    expect(none.body.error.message).toMatch(/No photo arrived/);
    const step = await refusedLeavesNothing(() => upload(tech, walkId, good, 'a.jpg', 'no-such-step'));
    expect(step.status).toBe(400);
  });

  it('accepts PNG and WebP, keeping their type', async () => {
    const png = await sharp({ create: { width: 40, height: 30, channels: 4, background: '#ff000080' } }).png().toBuffer();
    const webp = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#00ff00' } }).webp().toBuffer();
    const a = await upload(tech, walkId, png, 'x.png');
    const b = await upload(tech, walkId, webp, 'x.webp');
    expect((await tech.get(a.body.photo.url)).headers['content-type']).toBe('image/png');
    expect((await tech.get(b.body.photo.url)).headers['content-type']).toBe('image/webp');
  });

  it("hides photos from other shops and from anyone signed out; ids are not paths", async () => {
    const res = await upload(tech, walkId, await jpegWithGps());
    const o = await signedIn(t.app, other.people.owner.email);
    expect((await o.get(res.body.photo.url)).status).toBe(404);
    expect((await o.get(res.body.photo.thumbUrl)).status).toBe(404);
    expect((await request(t.app).get(res.body.photo.url)).status).toBe(401);
    expect((await o.post(`/api/walks/${walkId}/photos`).field('step', 'trim-idle').attach('photo', await jpegWithGps(), 'a.jpg')).status).toBe(404);
    expect((await tech.get('/api/photos/..%2F..%2Fetc%2Fpasswd')).status).toBe(404);
    expect((await tech.get(`/api/photos/${shop.shopId}%2F${res.body.photo.id}.jpg`)).status).toBe(404);
    // Support staff of the same shop may see photos (they read guest walks).
    const support = await signedIn(t.app, shop.people.support.email);
    expect((await support.get(res.body.photo.url)).status).toBe(200);
  });

  it('removes a photo from an open walk, files included; a finished walk takes no photos', async () => {
    const id = await newWalk(tech);
    const res = await upload(tech, id, await jpegWithGps());
    const before = filesUnder(photosDir).length;
    expect((await tech.delete(`/api/walks/${id}/photos/${res.body.photo.id}`)).status).toBe(204);
    expect(filesUnder(photosDir)).toHaveLength(before - 2);
    expect(await t.knex('photos').where({ id: res.body.photo.id }).first()).toBeUndefined();
    expect((await tech.get(res.body.photo.url)).status).toBe(404);

    await tech.post(`/api/walks/${id}/finish`).send({ outcome: 'not_fixed' });
    const late = await refusedLeavesNothing(async () => upload(tech, id, await jpegWithGps()));
    expect(late.status).toBe(409);
  });
});
