import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import type { ParsedMail } from 'mailparser';
import { ROLES, type Role } from '@/shared/roles';
import { apiRoutes } from '@/server/routes';
import { createPassport } from '@/server/auth/passport-setup';
import type { RouteDef } from '@/server/http/route-table';
import { GUEST, GUEST_COOKIE, signBinding } from '@/server/http/guest-access';
import { installStockTrees } from '@/server/services/tree-stock';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';
import { startTestMailCatcher } from '../support/mail-catcher';

const uuid = () => crypto.randomUUID();
const tag = () => crypto.randomBytes(4).toString('hex');
const sha256 = (s: string) => crypto.createHash('sha256').update(s).digest('hex');
type Agent = Awaited<ReturnType<typeof signedIn>>;

// A path through the stock tree "lean-after-intake-manifold" to a cause (the same one the walks tests use).
const LEAN_PATH = [
  { type: 'reading', value: 18, unit: '%' },
  { type: 'reading', value: 3, unit: '%' },
  { type: 'reading', value: 15, unit: 'inHg' },
  { type: 'answer.hose-off' },
];

const photo = () => sharp({ create: { width: 640, height: 480, channels: 3, background: '#4a6b5c' } }).jpeg().toBuffer();

/** The /g/<token> address in a guest link mail. */
function guestLinkFrom(mail: ParsedMail): { url: URL; token: string } {
  const m = (mail.text ?? '').match(/https?:\/\/\S+\/g\/([A-Za-z0-9_-]+)/);
  if (!m) throw new Error(`no guest link in mail "${mail.subject}"`);
  return { url: new URL(m[0]), token: m[1] };
}

describe('guest links', () => {
  let catcher: Awaited<ReturnType<typeof startTestMailCatcher>>;
  let t: ReturnType<typeof createTestApp>;
  let shop: TestShop;
  let other: TestShop;
  let treeId: number;
  let support: Agent;

  beforeAll(async () => {
    catcher = await startTestMailCatcher();
    t = createTestApp(catcher.appConfig());
    shop = await createShopWithPeople(t.knex, 'Guest');
    other = await createShopWithPeople(t.knex, 'Other');
    await installStockTrees(t.knex, shop.shopId);
    await t.knex('shops').where({ id: shop.shopId }).update({ contact_phone: '+1 555 0142', contact_email: 'desk@guest-shop.example' });
    treeId = (await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id')).id;
    support = await signedIn(t.app, shop.people.support.email);
  });
  afterAll(async () => {
    await t.close();
    await catcher.close();
  });

  /** Support creates a link; with an address it is e-mailed and the token is read from the mail. */
  async function createLink(opts: { email?: string; send?: boolean; days?: number; by?: Agent } = {}) {
    const email = opts.email ?? `driver-${tag()}@home.example`;
    const res = await (opts.by ?? support)
      .post('/api/guest-links')
      .send({ treeId, customerName: 'Sam Ortega', customerEmail: email, expiresInDays: opts.days, note: 'Called about a whistle at idle', send: opts.send ?? true });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const token = new URL(res.body.url).pathname.split('/').pop()!;
    return { id: res.body.link.id as number, token, email, res };
  }

  /** A fresh browser opening a link: the binding cookie lands in the agent's jar. */
  async function openAsGuest(token: string) {
    const g = agent(t.app);
    const res = await g.post('/api/guest/open').send({ token });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith(`${GUEST_COOKIE}=`))!;
    return { g, linkId: res.body.linkId as number, cookie, base: `/api/guest/links/${res.body.linkId}` };
  }

  it('creates a link on the published version, e-mails shop name, safety note and link, and keeps only a hash', async () => {
    const { id, token, email, res } = await createLink();
    const version = (await t.knex('trees').where({ id: treeId }).first('published_version_id')).published_version_id;
    expect(res.body.link).toMatchObject({ status: 'not_opened', customerName: 'Sam Ortega', customerEmail: email, tree: { id: treeId, versionId: version }, sentCount: 1 });
    expect(res.body.mailed).toBe(true);
    const days = (Date.parse(res.body.link.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
    // At least 128 random bits: 32 bytes in base64url are 43 characters.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    const mail = await catcher.waitForMail(email);
    expect(mail.subject).toContain(shop.name);
    expect(mail.text).toContain(shop.name);
    expect(mail.text).toMatch(/engine work can hurt/i);
    expect(mail.text).toMatch(/stop and call the shop or a professional/i);
    expect(mail.text).toMatch(/Local rules apply/);
    expect(mail.text).toContain('+1 555 0142');
    const link = guestLinkFrom(mail);
    expect(link.token).toBe(token);
    expect(link.url.pathname).toBe(`/g/${token}`);
    expect(link.url.origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);

    // Tokens are not stored in clear text: the row holds the SHA-256 and nothing else of it.
    const row = await t.knex('guest_links').where({ id }).first();
    expect(row.token_hash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);
    const [[dump]] = await t.knex.raw('SELECT COUNT(*) AS n FROM guest_links WHERE CONCAT_WS(" ", customer_name, customer_email, note, token_hash) LIKE ?', [`%${token}%`]);
    expect(Number(dump.n)).toBe(0);
  });

  it('checks the form: e-mail needed to send, expiry 1 to 30 days, a published tree of this shop', async () => {
    const noMail = await support.post('/api/guest-links').send({ treeId, customerName: 'Ana', send: true });
    expect(noMail.status).toBe(400);
    expect(noMail.body.error.details.fields.customerEmail).toMatch(/e-mail address/);
    const tooLong = await support.post('/api/guest-links').send({ treeId, customerName: 'Ana', expiresInDays: 31 });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.details.fields.expiresInDays).toMatch(/at most 30 days/);
    const elsewhere = await signedIn(t.app, other.people.support.email);
    expect((await elsewhere.post('/api/guest-links').send({ treeId, customerName: 'Ana' })).status).toBe(409);
    // Copy instead of send: no mail, the address to copy is answered once.
    const copy = await support.post('/api/guest-links').send({ treeId, customerName: 'Ana', expiresInDays: 30 });
    expect(copy.status).toBe(201);
    expect(copy.body.mailed).toBe(false);
    expect(copy.body.url).toMatch(/\/g\/[A-Za-z0-9_-]{43}$/);
    expect(copy.body.link.sentCount).toBe(0);
    // The list never carries a token.
    const list = await support.get('/api/guest-links');
    expect(JSON.stringify(list.body)).not.toContain(copy.body.url.split('/g/')[1]);
  });

  it('a guest acknowledges the safety notice, walks to a cause with a reading and a photo; support reviews it and turns it into a job', async () => {
    const { id, token } = await createLink();
    const { g, linkId, cookie, base } = await openAsGuest(token);
    expect(linkId).toBe(id);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toContain(`Path=/api/guest/links/${id}`);
    expect((await support.get(`/api/guest-links/${id}`)).body.link.status).toBe('in_progress');

    const first = await g.get(base);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ linkId: id, customerName: 'Sam Ortega', acknowledgedAt: null, walk: null, shop: { name: shop.name, phone: '+1 555 0142' } });
    // Nothing can be recorded before the safety notice is accepted.
    expect((await g.post(`${base}/steps`).send({ stepId: uuid(), event: LEAN_PATH[0] })).status).toBe(409);

    const ack = await g.post(`${base}/acknowledge`).send({});
    expect(ack.status).toBe(200);
    expect(ack.body.acknowledgedAt).toBeTruthy();
    expect(ack.body.walk.position.stepId).toBe('trim-idle');
    expect(ack.body.walk.walk.jobId).toBeNull();
    // Sent twice, the walk still starts once.
    expect((await g.post(`${base}/acknowledge`).send({})).body.walk.walk.id).toBe(ack.body.walk.walk.id);

    for (const event of LEAN_PATH) {
      const res = await g.post(`${base}/steps`).send({ stepId: uuid(), event, note: event.type === 'answer.hose-off' ? 'Found the hose loose' : null });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    }
    const up = await g.post(`${base}/photos`).field('step', 'vacuum-hose-off-or-split').attach('photo', await photo(), { filename: 'hose.jpg', contentType: 'image/jpeg' });
    expect(up.status, JSON.stringify(up.body)).toBe(201);
    expect(up.body.photo.url).toBe(`${base}/photos/${up.body.photo.id}`);
    const served = await g.get(up.body.photo.thumbUrl).buffer(true);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    const fin = await g.post(`${base}/finish`).send({ outcome: 'fixed' });
    expect(fin.status).toBe(200);
    expect(fin.body.walk.walk).toMatchObject({ status: 'finished', outcome: 'fixed', causeStep: 'vacuum-hose-off-or-split' });
    expect((await g.post(`${base}/steps`).send({ stepId: uuid(), event: { type: 'done' } })).status).toBe(409);

    // Support sees the finished walk with its steps, readings, photos and outcome.
    const detail = await support.get(`/api/guest-links/${id}`);
    expect(detail.body.link.status).toBe('finished');
    expect(detail.body.walk.history.map((h: { verdict: string | null }) => h.verdict)).toEqual(['lean', 'normal', 'low', null]);
    expect(detail.body.walk.history[0]).toMatchObject({ readingValue: 18, readingUnit: '%', by: null });
    expect(detail.body.walk.history[3].note).toBe('Found the hose loose');
    expect(detail.body.walk.photos).toHaveLength(1);
    expect((await support.get(detail.body.walk.photos[0].url)).status).toBe(200);
    const listed = (await support.get('/api/guest-links?status=finished')).body.links.find((l: { id: number }) => l.id === id);
    expect(listed.walk).toMatchObject({ status: 'finished', outcome: 'fixed', stepCount: 4 });

    const handled = await support.post(`/api/guest-links/${id}/handled`).send({ handled: true });
    expect(handled.body.link.handledBy.id).toBe(shop.people.support.id);

    const ro = `G-${tag()}`;
    const job = await support.post(`/api/guest-links/${id}/job`).send({ roNumber: ro, customerName: 'Sam Ortega', install: [{ type: 'intake_manifold', text: 'Ported intake' }] });
    expect(job.status, JSON.stringify(job.body)).toBe(201);
    expect(job.body.job).toMatchObject({ roNumber: ro, customerName: 'Sam Ortega', walkCount: 1 });
    expect(job.body.link.jobId).toBe(job.body.job.id);
    const walkRow = await t.knex('walks').where({ id: ack.body.walk.walk.id }).first('job_id');
    expect(walkRow.job_id).toBe(job.body.job.id);
    const tech = await signedIn(t.app, shop.people.tech.email);
    expect((await tech.get(`/api/jobs/${job.body.job.id}/walks`)).body.items.map((w: { id: number }) => w.id)).toEqual([ack.body.walk.walk.id]);
    expect((await support.post(`/api/guest-links/${id}/job`).send({ roNumber: `${ro}-2`, customerName: 'Sam' })).status).toBe(409);
    // The guest still sees their own walk, never the job's staff details.
    expect((await g.get(base)).body.walk.job).toBeNull();
  });

  it('one guest cannot read or write another guest\'s walk', async () => {
    const a = await openAsGuest((await createLink()).token);
    const b = await openAsGuest((await createLink()).token);
    for (const x of [a, b]) expect((await x.g.post(`${x.base}/acknowledge`).send({})).status).toBe(200);
    const bPhoto = await b.g.post(`${b.base}/photos`).field('step', 'trim-idle').attach('photo', await photo(), 'b.jpg');
    expect(bPhoto.status).toBe(201);

    // A's browser asking for B's paths: the cookie is scoped to A's link, so nothing binds.
    expect((await a.g.get(b.base)).status).toBe(401);
    expect((await a.g.post(`${b.base}/steps`).send({ stepId: uuid(), event: LEAN_PATH[0] })).status).toBe(401);
    // A's cookie sent by hand to B's paths: it names A's link, so it is refused.
    const aValue = a.cookie.split(';')[0];
    for (const call of [
      request(t.app).get(b.base),
      request(t.app).post(`${b.base}/steps`).set('X-Baywalk-Request', '1').send({ stepId: uuid(), event: LEAN_PATH[0] }),
      request(t.app).get(`${b.base}/photos/${bPhoto.body.photo.id}`),
    ]) {
      const res = await call.set('Cookie', aValue);
      expect(res.status).toBe(403);
      expect(res.body.error.message).toMatch(/another guest link/);
    }
    // A forged binding (another server's secret) binds nothing.
    const forged = `${GUEST_COOKIE}=${signBinding('not-this-server', b.linkId)}`;
    expect((await request(t.app).get(b.base).set('Cookie', forged)).status).toBe(401);
    // B's photo through A's own walk is not found.
    expect((await a.g.get(`${a.base}/photos/${bPhoto.body.photo.id}`)).status).toBe(404);
    expect(await t.knex('walk_steps').where({ walk_id: (await b.g.get(b.base)).body.walk.walk.id }).count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('refuses expired, revoked and unknown links, with the shop contact for the page the guest sees', async () => {
    const revoked = await createLink();
    const bound = await openAsGuest(revoked.token);
    const rv = await support.post(`/api/guest-links/${revoked.id}/revoke`).send({});
    expect(rv.body.link.status).toBe('revoked');
    const again = await agent(t.app).post('/api/guest/open').send({ token: revoked.token });
    expect(again.status).toBe(410);
    expect(again.body.error).toMatchObject({ code: 'link_revoked', details: { shop: { name: shop.name, phone: '+1 555 0142', email: 'desk@guest-shop.example' } } });
    // The browser bound before is refused too.
    const boundNow = await bound.g.get(bound.base);
    expect(boundNow.status).toBe(410);
    expect(boundNow.body.error.code).toBe('link_revoked');
    expect((await support.post(`/api/guest-links/${revoked.id}/resend`).send({ by: 'copy' })).status).toBe(409);

    const expired = await createLink();
    await t.knex('guest_links').where({ id: expired.id }).update({ expires_at: new Date(Date.now() - 1000) });
    const late = await agent(t.app).post('/api/guest/open').send({ token: expired.token });
    expect(late.status).toBe(410);
    expect(late.body.error.code).toBe('link_expired');
    expect(late.body.error.message).toContain('+1 555 0142');
    expect((await support.get(`/api/guest-links/${expired.id}`)).body.link.status).toBe('expired');

    const unknown = await agent(t.app).post('/api/guest/open').send({ token: crypto.randomBytes(32).toString('base64url') });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('link_invalid');
    const broken = await agent(t.app).post('/api/guest/open').send({ token: 'short' });
    expect(broken.status).toBe(400);
    expect(broken.body.error.details.fields.token).toMatch(/not complete/);
  });

  it('resend makes a fresh link; the one before stops working, a bound browser keeps its place', async () => {
    const { id, token, email } = await createLink();
    const bound = await openAsGuest(token);
    const res = await support.post(`/api/guest-links/${id}/resend`).send({ by: 'email' });
    expect(res.status).toBe(200);
    expect(res.body.link.sentCount).toBe(2);
    const fresh = guestLinkFrom(await catcher.waitForMail(email, 2)).token;
    expect(fresh).not.toBe(token);
    expect((await agent(t.app).post('/api/guest/open').send({ token })).status).toBe(404);
    expect((await agent(t.app).post('/api/guest/open').send({ token: fresh })).status).toBe(200);
    expect((await bound.g.get(bound.base)).status).toBe(200);
    expect((await t.knex('guest_links').where({ id }).first('token_hash')).token_hash).toBe(sha256(fresh));
  });

  it('caps steps and photos on a guest walk with a clear 429', async () => {
    const { token } = await createLink();
    const { g, base } = await openAsGuest(token);
    const walkId = (await g.post(`${base}/acknowledge`).send({})).body.walk.walk.id as number;
    // Fill the walk to its caps directly (150 records, 12 photos), then ask for one more of each.
    await t.knex('walk_steps').insert(
      Array.from({ length: 150 }, (_, i) => ({ id: uuid(), walk_id: walkId, shop_id: shop.shopId, seq: i + 1, kind: 'undo', from_step: 'trim-idle', to_step: 'trim-idle' })),
    );
    const step = await g.post(`${base}/steps`).send({ stepId: uuid(), event: LEAN_PATH[0] });
    expect(step.status).toBe(429);
    expect(step.body.error).toMatchObject({ code: 'guest_step_cap' });
    expect(step.body.error.message).toMatch(/limit of 150 recorded steps.*saved/);
    await t.knex('walk_steps').where({ walk_id: walkId }).delete();

    const ids = Array.from({ length: 12 }, () => uuid());
    await t.knex('photos').insert(ids.map((id) => ({ id, shop_id: shop.shopId, content_type: 'image/jpeg', width: 1, height: 1, bytes: 1, storage_key: `x/${id}`, thumb_key: `x/${id}-t` })));
    await t.knex('walk_photos').insert(ids.map((id) => ({ photo_id: id, walk_id: walkId, shop_id: shop.shopId, step_id: 'trim-idle', at_seq: 0 })));
    const up = await g.post(`${base}/photos`).field('step', 'trim-idle').attach('photo', await photo(), 'one-more.jpg');
    expect(up.status).toBe(429);
    expect(up.body.error.message).toMatch(/already has 12 photos/);
    // One place left and two uploads at once: the cap is checked again under the walk's lock, so one of them gets it.
    await t.knex('walk_photos').where({ walk_id: walkId, photo_id: ids[0] }).delete();
    const both = await Promise.all([1, 2].map(async (n) => g.post(`${base}/photos`).field('step', 'trim-idle').attach('photo', await photo(), `race-${n}.jpg`)));
    expect(both.map((r) => r.status).sort()).toEqual([201, 429]);
    expect(Number((await t.knex('walk_photos').where({ walk_id: walkId }).count({ n: '*' }).first())!.n)).toBe(12);
    // Guest photos have a tighter size cap than staff photos (6 MB against 10 MB).
    const big = await g.post(`${base}/photos`).field('step', 'trim-idle').attach('photo', Buffer.alloc(7 * 1024 * 1024, 0xff), 'big.jpg');
    expect(big.status).toBe(413);
    expect(big.body.error.message).toMatch(/larger than 6 MB/);
  });

  describe('access: guest routes against staff, staff routes against guests', () => {
    const routes: RouteDef[] = [];
    beforeAll(() => {
      routes.push(...apiRoutes(t.services, createPassport(t.knex) as never));
    });
    const path = (r: RouteDef, linkId: number) => `/api${r.path.replace(':linkId', String(linkId)).replace(/:(\w+)/g, '987654321')}`;
    const call = (a: ReturnType<typeof agent> | ReturnType<typeof request>, r: RouteDef, p: string) =>
      r.method === 'get' || r.method === 'delete' ? (a as ReturnType<typeof agent>)[r.method](p) : (a as ReturnType<typeof agent>)[r.method](p).send({});

    it('the table has guest routes, each allowing guests only', () => {
      const guestRoutes = routes.filter((r) => r.allow !== 'public' && r.allow.includes(GUEST));
      expect(guestRoutes.length).toBeGreaterThanOrEqual(8);
      for (const r of guestRoutes) expect(r.allow).toEqual([GUEST]);
      expect(routes.filter((r) => r.path.startsWith('/guest/') && r.allow !== 'public').every((r) => guestRoutes.includes(r))).toBe(true);
    });

    it('no staff role can use a guest route, even with a guest binding; anonymous callers are told to open their link', async () => {
      const { token } = await createLink();
      const { linkId, cookie } = await openAsGuest(token);
      const guestRoutes = routes.filter((r) => r.allow !== 'public' && r.allow.includes(GUEST));
      for (const role of ROLES as readonly Role[]) {
        const staff = await signedIn(t.app, shop.people[role].email);
        for (const r of guestRoutes) {
          const res = await call(staff, r, path(r, linkId)).set('Cookie', cookie.split(';')[0]);
          expect(res.status, `${role} ${r.method} ${r.path}`).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
      }
      for (const r of guestRoutes) {
        const res = await call(agent(t.app), r, path(r, linkId));
        expect(res.status, `anonymous ${r.method} ${r.path}`).toBe(401);
      }
    });

    it('a guest can do nothing with staff routes (every route not public, not guest)', async () => {
      const { token } = await createLink();
      const { cookie } = await openAsGuest(token);
      const staffRoutes = routes.filter((r) => r.allow !== 'public' && !r.allow.includes(GUEST));
      expect(staffRoutes.length).toBeGreaterThan(10);
      for (const r of staffRoutes) {
        const res = await call(agent(t.app), r, path(r, 1)).set('Cookie', cookie.split(';')[0]);
        expect(res.status, `${r.method} ${r.path}`).toBe(401);
        expect(res.body.error.code).toBe('unauthenticated');
      }
    });

    it('only support, leads and owners manage links', async () => {
      const tech = await signedIn(t.app, shop.people.tech.email);
      expect((await tech.get('/api/guest-links')).status).toBe(403);
      expect((await tech.post('/api/guest-links').send({ treeId, customerName: 'X' })).status).toBe(403);
      for (const role of ['owner', 'lead'] as const) {
        const a = await signedIn(t.app, shop.people[role].email);
        expect((await createLink({ by: a, send: false })).res.body.link.createdBy.id).toBe(shop.people[role].id);
      }
      // Another shop's staff cannot see this shop's links.
      const { id } = await createLink({ send: false });
      const elsewhere = await signedIn(t.app, other.people.owner.email);
      expect((await elsewhere.get(`/api/guest-links/${id}`)).status).toBe(404);
      expect((await elsewhere.post(`/api/guest-links/${id}/revoke`).send({})).status).toBe(404);
    });
  });
});

describe('guest rate limits', () => {
  // Low limits for this app only: the limits are read from the environment when the app is built.
  const low = { BAYWALK_GUEST_LIMIT_OPEN_IP: '5', BAYWALK_GUEST_LIMIT_OPEN_TOKEN: '3', BAYWALK_GUEST_LIMIT_IP: '12', BAYWALK_GUEST_LIMIT_LINK: '6' };
  let t: ReturnType<typeof createTestApp>;
  let support: Agent;
  let treeId: number;
  // A new documentation-range address for each use, so no two checks share a counter by chance.
  let next = 0;
  const ip = () => `198.51.100.${++next}`;

  beforeAll(async () => {
    Object.assign(process.env, low);
    try {
      t = createTestApp();
    } finally {
      for (const k of Object.keys(low)) delete process.env[k];
    }
    const shop = await createShopWithPeople(t.knex, 'GuestLimit');
    await installStockTrees(t.knex, shop.shopId);
    treeId = (await t.knex('trees').where({ shop_id: shop.shopId, slug: 'lean-after-intake-manifold' }).first('id')).id;
    support = await signedIn(t.app, shop.people.support.email);
  });
  afterAll(() => t.close());

  const newToken = async () => {
    const res = await support.post('/api/guest-links').send({ treeId, customerName: 'Lee' });
    return new URL(res.body.url).pathname.split('/').pop()!;
  };

  it('per token: a link opened too often waits, with a clear 429 and Retry-After', async () => {
    const token = await newToken();
    const statuses = [];
    for (let i = 0; i < 4; i++) statuses.push((await agent(t.app).post('/api/guest/open').set('X-Forwarded-For', ip()).send({ token })).status);
    expect(statuses).toEqual([200, 200, 200, 429]);
    const res = await agent(t.app).post('/api/guest/open').set('X-Forwarded-For', ip()).send({ token });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(res.body.error.message).toMatch(/opened too many times.*Wait \d+ minutes? and try again/);
    expect(res.headers['retry-after']).toBeTruthy();
  });

  it('per address: guessing tokens from one address is stopped', async () => {
    const from = ip();
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push((await agent(t.app).post('/api/guest/open').set('X-Forwarded-For', from).send({ token: crypto.randomBytes(32).toString('base64url') })).status);
    expect(statuses).toEqual([404, 404, 404, 404, 404, 429]);
  });

  it('per link and per address on the walk routes', async () => {
    const g = agent(t.app);
    const opened = await g.post('/api/guest/open').set('X-Forwarded-For', ip()).send({ token: await newToken() });
    const base = `/api/guest/links/${opened.body.linkId}`;
    const statuses = [];
    // Each call from a new address: only the per-link count can stop them.
    for (let i = 0; i < 7; i++) statuses.push((await g.get(base).set('X-Forwarded-For', ip())).status);
    expect(statuses).toEqual([200, 200, 200, 200, 200, 200, 429]);
    const res = await g.get(base).set('X-Forwarded-For', ip());
    expect(res.body.error.message).toMatch(/Too many requests for this walk.*saved/);

    // One address across several links: the per-address count stops it.
    const from = ip();
    const codes = [];
    for (let i = 0; i < 3; i++) {
      const h = agent(t.app);
      const o = await h.post('/api/guest/open').set('X-Forwarded-For', ip()).send({ token: await newToken() });
      for (let j = 0; j < 5; j++) codes.push((await h.get(`/api/guest/links/${o.body.linkId}`).set('X-Forwarded-For', from)).status);
    }
    expect(codes.slice(0, 12).every((c) => c === 200)).toBe(true);
    expect(codes.slice(12)).toEqual([429, 429, 429]);
  });
});
