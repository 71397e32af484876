/// <reference types="node" />
import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { isImmutableAsset, mountStaticSite, pageHtml, withDrawing } from './static-site';

const HTML = '<!doctype html><body><div id="boot-shell" hidden><h1>Baywalk</h1></div><div id="root"></div></body>';

describe('static site', () => {
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-site-'));
  fs.mkdirSync(path.join(dist, 'fonts'));
  fs.writeFileSync(path.join(dist, 'fonts/nunito-sans-400.abcd1234.woff2'), 'woff2');
  fs.writeFileSync(path.join(dist, 'favicon.ico'), 'icon');
  fs.writeFileSync(path.join(dist, 'index.html'), HTML);
  const app = express();
  mountStaticSite(app, dist);
  afterAll(() => fs.rmSync(dist, { recursive: true, force: true }));

  it('shows the pre-rendered sign-in shell on /sign-in only', async () => {
    const signIn = await request(app).get('/sign-in');
    expect(signIn.status).toBe(200);
    expect(signIn.headers['content-type']).toMatch(/text\/html/);
    expect(signIn.headers['cache-control']).toBe('no-cache');
    expect(signIn.text).toContain('<div id="boot-shell"><h1>');
    for (const url of ['/', '/walks/123', '/g/some-token', '/sign-up', '/sign-in-help']) {
      const other = await request(app).get(url);
      expect(other.status, url).toBe(200);
      expect(other.text, url).toBe(HTML);
    }
  });

  it('sends the page compressed when the browser takes it', async () => {
    // Raw bytes over a real socket: the test client would decompress for us.
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const br = await new Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
      http
        .get({ host: '127.0.0.1', port: (server.address() as { port: number }).port, path: '/walks/1', headers: { 'Accept-Encoding': 'gzip, deflate, br' } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }));
        })
        .on('error', reject);
    });
    server.close();
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers.vary).toMatch(/Accept-Encoding/);
    expect(zlib.brotliDecompressSync(br.body).toString()).toBe(HTML);
    const plain = await request(app).get('/walks/1').set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(HTML);
  });

  it('keeps the page as built when it has no shell', () => {
    expect(pageHtml('<div id="root"></div>', '/sign-in')).toBe('<div id="root"></div>');
  });

  it('caches hashed folders for a year and other files not at all', async () => {
    const font = await request(app).get('/fonts/nunito-sans-400.abcd1234.woff2');
    expect(font.status).toBe(200);
    expect(font.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const icon = await request(app).get('/favicon.ico');
    expect(icon.headers['cache-control']).not.toMatch(/immutable/);
    expect(isImmutableAsset(path.join('_expo', 'static', 'js', 'web', 'entry-1.js'))).toBe(true);
    expect(isImmutableAsset(path.join('assets', 'node_modules', 'x.png'))).toBe(true);
    expect(isImmutableAsset('index.html')).toBe(false);
    expect(isImmutableAsset(path.join('walks', 'assets', 'x.js'))).toBe(false);
  });

  it('answers 503 with a hint when the app is not built, and leaves /api alone', async () => {
    const empty = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-empty-'));
    const bare = express();
    mountStaticSite(bare, empty);
    bare.use((_req, res) => res.status(404).json({ error: { code: 'not_found' } }));
    try {
      const page = await request(bare).get('/sign-in');
      expect(page.status).toBe(503);
      expect(page.text).toMatch(/npm start/);
      const api = await request(bare).get('/api/nothing');
      expect(api.status).toBe(404);
      expect(api.body.error.code).toBe('not_found');
    } finally {
      fs.rmSync(empty, { recursive: true, force: true });
    }
  });
});

describe('withDrawing', () => {
  // The tags as `expo export` writes them (dist/index.html).
  const page =
    '<head><script src="/early-requests.js" defer></script><script src="/_expo/static/js/web/__expo-metro-runtime-abc.js" defer></script>' +
    '<script src="/_expo/static/js/web/__common-def.js" defer></script><script src="/_expo/static/js/web/entry-123.js" defer></script></head>' +
    '<body><div id="root"></div></body>';

  it("puts the drawing before the app's root and leaves the app's bundles to public/early-requests.js, in order", () => {
    const html = withDrawing(page, '<div id="drawn">step</div>');
    expect(html).toContain('<div id="drawn">step</div><div id="root">');
    expect([...html.matchAll(/data-app-src="([^"]+)"/g)].map((m) => m[1])).toEqual([
      '/_expo/static/js/web/__expo-metro-runtime-abc.js',
      '/_expo/static/js/web/__common-def.js',
      '/_expo/static/js/web/entry-123.js',
    ]);
    expect(html).not.toMatch(/<script src="\/_expo/);
    // The early reads still run as they did.
    expect(html).toContain('<script src="/early-requests.js" defer></script>');
  });
});

describe('pageHtml', () => {
  it('on the sign-in page, un-hides the shell and leaves the bundles to public/early-requests.js; elsewhere, the page as built', () => {
    const page = '<script src="/_expo/static/js/web/entry-1.js" defer></script><div id="boot-shell" hidden></div><div id="root"></div>';
    expect(pageHtml(page, '/sign-in')).toBe('<script type="text/plain" data-app-src="/_expo/static/js/web/entry-1.js"></script><div id="boot-shell"></div><div id="root"></div>');
    expect(pageHtml(page, '/jobs')).toBe(page);
  });
});
