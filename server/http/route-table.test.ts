import { describe, expect, it } from 'vitest';
import express from 'express';
import request from 'supertest';
import { z } from 'zod';
import { mountRoutes, type RouteDef } from './route-table';
import { accessGuard } from './access';
import { errorHandler } from '../middleware/error-handler';

function appWith(routes: RouteDef[], user?: { id: number; shopId: number; role: string }) {
  const app = express();
  app.use(express.json());
  app.use((req, _res, next) => {
    (req as { user?: unknown }).user = user;
    next();
  });
  const router = express.Router();
  mountRoutes(router, routes, accessGuard);
  app.use(router);
  app.use(errorHandler);
  return app;
}

describe('route table', () => {
  it('refuses to mount a route that declares no access rule', () => {
    const bad = { method: 'get', path: '/x', handler: () => ({}) } as unknown as RouteDef;
    expect(() => appWith([bad])).toThrow(/declares no access rule/);
  });

  it('answers 401 without a user and 403 for a role not listed', async () => {
    const route: RouteDef = { method: 'get', path: '/x', allow: ['owner'], handler: () => ({ ok: true }) };
    expect((await request(appWith([route])).get('/x')).status).toBe(401);
    const tech = appWith([route], { id: 1, shopId: 1, role: 'tech' });
    const res = await request(tech).get('/x');
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/role does not allow/);
    const owner = appWith([route], { id: 1, shopId: 1, role: 'owner' });
    expect((await request(owner).get('/x')).body).toEqual({ ok: true });
  });

  it('validates the body and names each bad field', async () => {
    const route: RouteDef = {
      method: 'post',
      path: '/y',
      allow: 'public',
      body: z.object({ name: z.string().min(1, 'Enter a name.'), age: z.number() }),
      handler: ({ body }) => body,
    };
    const res = await request(appWith([route])).post('/y').send({ name: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.fields.name).toBe('Enter a name.');
    expect(res.body.error.details.fields.age).toBeTruthy();
  });
});
