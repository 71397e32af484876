import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { sign } from 'cookie-signature';
import { loadConfig } from '@/server/config';
import { createTestApp } from '../support/test-app';

describe('GET /api/health', () => {
  const t = createTestApp();
  afterAll(() => t.close());

  it('reports the server and the database as up', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('ok');
    expect(res.body.database.ok).toBe(true);
    expect(res.body.database.version).toMatch(/MariaDB/);
  });

  it('sets helmet security headers', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('when the database is down', () => {
  // A port nothing listens on stands in for a stopped database.
  const t = createTestApp({ db: { ...loadConfig().db, port: 1 } });
  afterAll(() => t.close());

  it('health answers 503 with a clear message and the server keeps serving', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body.status).toBe('degraded');
    expect(res.body.server.ok).toBe(true);
    expect(res.body.database.ok).toBe(false);
    expect(res.body.database.message).toMatch(/database is not answering/i);
    const again = await request(t.app).get('/api/health');
    expect(again.status).toBe(503);
  });

  it('requests that need the database answer 503 with a message, not a crash', async () => {
    // A correctly signed session cookie makes the server read the session store.
    const signed = 's:' + sign('some-session-id', t.config.sessionSecret);
    const res = await request(t.app).get('/api/auth/me').set('Cookie', `baywalk.sid=${encodeURIComponent(signed)}`);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('database_unavailable');
    expect(res.body.error.message).toMatch(/saved work is safe/);
  });
});

describe('API edges', () => {
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-dist-'));
  fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Baywalk</title><div id="root"></div>');
  const t = createTestApp({ distDir: dist });
  afterAll(() => t.close());

  it('an unknown API path answers JSON 404, not the web page', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.type).toBe('application/json');
    expect(res.body.error.message).toMatch(/no API route/);
  });

  it('a malformed JSON body answers 400 with a message and no stack trace', async () => {
    const res = await request(t.app).post('/api/health').set('Content-Type', 'application/json').send('{"broken":');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('The request body is not valid JSON.');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });

  it('an oversized body answers 413', async () => {
    const res = await request(t.app)
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ x: 'a'.repeat(300_000) }));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('too_large');
  });

  it('any other path falls back to the single-page app', async () => {
    const res = await request(t.app).get('/jobs/42');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root">');
    expect(res.headers['cache-control']).toBe('no-cache');
  });
});
