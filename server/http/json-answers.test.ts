import http from 'node:http';
import type { AddressInfo } from 'node:net';
import zlib from 'node:zlib';
import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { sendJsonAnswer, sendKeptJson } from './json-answers';

const page = Object.freeze({ title: 'Lean after an intake manifold', steps: Array.from({ length: 200 }, (_, i) => ({ id: `step-${i}`, body: 'Spray around the runner flanges with the engine idling.' })) });
const small = Object.freeze({ ok: true });

function app() {
  const a = express();
  a.get('/page', (req, res) => sendKeptJson(req, res, page));
  a.get('/small', (req, res) => sendKeptJson(req, res, small));
  a.get('/made', (req, res, next) => sendJsonAnswer(req, res, { ...page }).catch(next));
  a.get('/made-small', (req, res, next) => sendJsonAnswer(req, res, { ok: true }).catch(next));
  return a;
}

/** The bytes as sent (supertest would undo the compression this checks). */
function fetchRaw(a: express.Express, path: string, acceptEncoding: string): Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const server = a.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      http
        .get({ host: '127.0.0.1', port, path, headers: { 'Accept-Encoding': acceptEncoding } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => server.close(() => resolve({ headers: res.headers, body: Buffer.concat(chunks) })));
        })
        .on('error', reject);
    });
  });
}

describe('JSON answers', () => {
  it('sends Brotli to a client that takes it, gzip to one that takes only gzip, plain text otherwise, all the same JSON', async () => {
    const a = app();
    const br = await fetchRaw(a, '/page', 'gzip, deflate, br, zstd');
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers.vary).toMatch(/Accept-Encoding/);
    expect(br.headers['cache-control']).toBe('private, no-cache');
    expect(JSON.parse(zlib.brotliDecompressSync(br.body).toString())).toEqual(page);
    expect(br.body.length).toBeLessThan(JSON.stringify(page).length / 5);

    const gz = await fetchRaw(a, '/page', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(JSON.parse(zlib.gunzipSync(gz.body).toString())).toEqual(page);

    const plain = await fetchRaw(a, '/page', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers['content-type']).toMatch(/^application\/json/);
    expect(JSON.parse(plain.body.toString())).toEqual(page);
    expect(new Set([br.headers.etag, gz.headers.etag, plain.headers.etag]).size).toBe(1);
  });

  it('answers 304 to a matching If-None-Match, and leaves small answers uncompressed', async () => {
    const a = app();
    const first = await request(a).get('/page');
    const again = await request(a).get('/page').set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
    const tiny = await request(a).get('/small').set('Accept-Encoding', 'br');
    expect(tiny.headers['content-encoding']).toBeUndefined();
    expect(tiny.body).toEqual({ ok: true });
  });

  it('compresses an answer made for the request once it is 4 KB or more, and leaves small ones alone', async () => {
    const a = app();
    const br = await fetchRaw(a, '/made', 'gzip, deflate, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(JSON.parse(zlib.brotliDecompressSync(br.body).toString())).toEqual(page);
    const gz = await fetchRaw(a, '/made', 'gzip');
    expect(JSON.parse(zlib.gunzipSync(gz.body).toString())).toEqual(page);
    const small = await fetchRaw(a, '/made-small', 'gzip, deflate, br');
    expect(small.headers['content-encoding']).toBeUndefined();
    expect(JSON.parse(small.body.toString())).toEqual({ ok: true });
  });
});
