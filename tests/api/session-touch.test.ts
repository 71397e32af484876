import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../support/test-app';
import { createShopWithPeople, signedIn, type TestShop } from '../support/people';

/**
 * Rolling sessions write their expiry back to MariaDB; doing that on every
 * request made each read a durable write (the load benchmark's finding). The
 * store now writes at most once a minute per session, and the session still
 * works and still rolls in the browser.
 */
describe('session expiry write-back', () => {
  const t = createTestApp();
  let shop: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Touch');
  });
  afterAll(() => t.close());

  it('reads do not rewrite the stored session each time, and the cookie still rolls', async () => {
    const a = await signedIn(t.app, shop.people.tech.email);
    const rows = () => t.knex('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [shop.people.tech.id]).select('sid', 'expired');
    const [before] = await rows();
    expect(before).toBeDefined();
    // The stored expiry has whole-second precision: wait past it so a write-back would show.
    await new Promise((r) => setTimeout(r, 1100));
    for (let i = 0; i < 5; i++) {
      const res = await a.get('/api/auth/me');
      expect(res.status).toBe(200);
      expect(res.body.user.id).toBe(shop.people.tech.id);
      expect(res.headers['set-cookie']?.[0]).toMatch(/^baywalk\.sid=.*Expires=/);
    }
    const [after] = await rows();
    expect(after.sid).toBe(before.sid);
    expect(new Date(after.expired).getTime()).toBe(new Date(before.expired).getTime());
  });
});
