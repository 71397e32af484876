import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@/shared/roles';
import { apiRoutes } from '@/server/routes';
import { createPassport } from '@/server/auth/passport-setup';
import type { RouteDef } from '@/server/http/route-table';
import { createTestApp } from '../support/test-app';
import { agent, createShopWithPeople, signedIn, type TestShop } from '../support/people';

/**
 * Every route of the API route table, called as anonymous and as each role,
 * must answer exactly as its `allow` declares: 401 for nobody signed in, 403
 * for a role not listed, and for anyone allowed neither of those nor a 5xx
 * (a validation error or a 404 for an id that does not exist is "let
 * through"). The list is read from the table itself, so routes added later
 * are covered without touching this file.
 */
const t = createTestApp();
const routes: RouteDef[] = apiRoutes(t.services, createPassport(t.knex) as never);
const MISSING_ID = '987654321';

/** A concrete path: every parameter gets an id that does not exist; optional groups are kept. */
export function concretePath(path: string): string {
  return `/api${path.replace(/[{}]/g, '').replace(/\*\w+/g, 'x').replace(/:(\w+)/g, MISSING_ID)}`;
}

type Caller = 'anonymous' | Role;
const CALLERS: Caller[] = ['anonymous', ...ROLES];

function expected(route: RouteDef, caller: Caller): 'unauthenticated' | 'forbidden' | 'allowed' {
  if (route.allow === 'public') return 'allowed';
  if (caller === 'anonymous') return 'unauthenticated';
  return route.allow.includes(caller) ? 'allowed' : 'forbidden';
}

describe('role × route matrix (generated from the route table)', () => {
  let shop: TestShop;
  beforeAll(async () => {
    shop = await createShopWithPeople(t.knex, 'Matrix');
  });
  afterAll(() => t.close());

  it('the table has routes and every one declares who may call it', () => {
    expect(routes.length).toBeGreaterThan(10);
    for (const r of routes) expect(r.allow === 'public' || (Array.isArray(r.allow) && r.allow.length > 0)).toBe(true);
  });

  for (const route of routes) {
    for (const caller of CALLERS) {
      const want = expected(route, caller);
      it(`${route.method.toUpperCase()} ${route.path} as ${caller} → ${want}`, async () => {
        // A fresh session per call: some routes (sign-out) end the session they run in.
        const a = caller === 'anonymous' ? agent(t.app) : await signedIn(t.app, shop.people[caller].email);
        const call = a[route.method](concretePath(route.path));
        const res = route.method === 'get' || route.method === 'delete' ? await call : await call.send({});
        const where = `${res.status} ${JSON.stringify(res.body).slice(0, 200)}`;
        expect(res.status, where).toBeLessThan(500);
        if (want === 'unauthenticated') {
          expect(res.status, where).toBe(401);
          expect(res.body.error.code).toBe('unauthenticated');
        } else if (want === 'forbidden') {
          expect(res.status, where).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        } else {
          expect([401, 403], where).not.toContain(res.status);
        }
      });
    }
  }
});
