/// <reference types="node" />
import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { precompress } from './compressed-assets';
import { mountStaticSite } from './static-site';

describe('compressed hashed assets', () => {
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-dist-'));
  const js = 'console.log("a fairly repetitive bundle");\n'.repeat(500);
  fs.mkdirSync(path.join(dist, '_expo/static/js/web'), { recursive: true });
  fs.writeFileSync(path.join(dist, '_expo/static/js/web/entry-abc123.js'), js);
  fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Baywalk</title>');
  fs.writeFileSync(path.join(os.tmpdir(), 'outside-dist.js'), js);
  const app = express();
  mountStaticSite(app, dist);
  afterAll(() => fs.rmSync(dist, { recursive: true, force: true }));

  it('sends Brotli when accepted, gzip otherwise, identity when neither, always cached for a year', async () => {
    const url = '/_expo/static/js/web/entry-abc123.js';
    // Raw bytes over a real socket: the test clients would decompress for us.
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const br = await new Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
      http
        .get({ host: '127.0.0.1', port: (server.address() as { port: number }).port, path: url, headers: { 'Accept-Encoding': 'gzip, deflate, br, zstd' } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
        })
        .on('error', reject);
    });
    server.close();
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers.vary).toMatch(/Accept-Encoding/);
    expect(zlib.brotliDecompressSync(br.body).toString()).toBe(js);
    expect(br.body.length).toBeLessThan(js.length / 5);

    const gz = await request(app).get(url).set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.text).toBe(js); // supertest inflates gzip

    const plain = await request(app).get(url).set('Accept-Encoding', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(js);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('never reads outside the build folder, and leaves index.html revalidated', async () => {
    for (const p of ['/_expo/static/..%2f..%2f..%2foutside-dist.js', '/_expo/static/%2e%2e/%2e%2e/%2e%2e/outside-dist.js']) {
      // Such paths fall through to the page itself (itself compressed), never to the file outside.
      const res = await request(app).get(p).set('Accept-Encoding', 'gzip');
      expect(res.headers['content-type'], p).toMatch(/text\/html/);
      expect(res.text ?? '', p).not.toContain('fairly repetitive');
    }
    const index = await request(app).get('/jobs').set('Accept-Encoding', 'br');
    expect(index.headers['cache-control']).toBe('no-cache');
  });

  it('sends the copies the build compressed ahead, as they are', async () => {
    const built = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-built-'));
    try {
      const dir = path.join(built, '_expo/static/js/web');
      fs.mkdirSync(dir, { recursive: true });
      fs.writeFileSync(path.join(dir, 'entry-def456.js'), js);
      fs.writeFileSync(path.join(dir, 'tiny-1.js'), 'x');
      fs.writeFileSync(path.join(built, 'index.html'), '<!doctype html>');
      expect(await precompress(built)).toBe(1);
      expect(fs.existsSync(path.join(dir, 'tiny-1.js.br'))).toBe(false);
      expect(zlib.brotliDecompressSync(fs.readFileSync(path.join(dir, 'entry-def456.js.br'))).toString()).toBe(js);
      // A marker in the stored copy proves it is sent rather than compressed again.
      const marked = 'console.log("stored copy");';
      fs.writeFileSync(path.join(dir, 'entry-def456.js.br'), zlib.brotliCompressSync(marked));
      fs.writeFileSync(path.join(dir, 'entry-def456.js.gz'), zlib.gzipSync(marked));
      const site = express();
      mountStaticSite(site, built);
      const gz = await request(site).get('/_expo/static/js/web/entry-def456.js').set('Accept-Encoding', 'gzip');
      expect(gz.headers['content-encoding']).toBe('gzip');
      expect(gz.text).toBe(marked);
    } finally {
      fs.rmSync(built, { recursive: true, force: true });
    }
  });
});
