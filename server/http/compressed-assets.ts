/// <reference types="node" />
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { promisify } from 'node:util';
import type { RequestHandler } from 'express';

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

/** Text-like build files worth compressing (fonts included: TTF shrinks by about half). */
const COMPRESSIBLE = /\.(?:js|css|json|svg|ttf|otf|map|txt)$/i;
const MIN_BYTES = 1024;
const MAX_ENTRIES = 300;

interface Encoded {
  br: Buffer;
  gzip: Buffer;
}

/**
 * Serves the web build's hashed files (dist/_expo/static, dist/assets)
 * compressed: Brotli when the browser takes it, else gzip. The build's main
 * bundle is about 2.7 MB of JavaScript; compressed it is about a fifth of
 * that, which is what a phone on a mobile network waits for. Each file is
 * compressed once, on its first request, and kept in memory: hashed file
 * names never change content. Anything else falls through to express.static.
 */
export function compressedAssets(distDir: string): RequestHandler {
  const root = path.resolve(distDir);
  const cache = new Map<string, Promise<Encoded | null>>();

  const encode = (file: string): Promise<Encoded | null> =>
    fs.promises
      .readFile(file)
      .then(async (data) => {
        if (data.length < MIN_BYTES) return null;
        const [br, gz] = await Promise.all([
          brotli(data, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 9, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length } }),
          gzip(data, { level: 9 }),
        ]);
        return { br, gzip: gz };
      })
      .catch(() => null);

  return (req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !COMPRESSIBLE.test(req.path)) return next();
    if (!req.path.startsWith('/_expo/static/') && !req.path.startsWith('/assets/')) return next();
    // Brotli whenever the browser lists it (browsers list gzip first at equal weight), else gzip.
    const encoding = req.acceptsEncodings('br') === 'br' ? 'br' : req.acceptsEncodings('gzip') === 'gzip' ? 'gzip' : undefined;
    if (!encoding) return next();
    let file: string;
    try {
      file = path.resolve(root, `.${decodeURIComponent(req.path)}`);
    } catch {
      return next();
    }
    // Never outside the build folder (static-site's own checks apply to everything else).
    if (!file.startsWith(root + path.sep) || file.includes('\0')) return next();
    fs.stat(file, (err, stat) => {
      if (err || !stat.isFile()) return next();
      let pending = cache.get(file);
      if (!pending) {
        if (cache.size >= MAX_ENTRIES) cache.delete(cache.keys().next().value!);
        pending = encode(file);
        cache.set(file, pending);
      }
      pending.then((encoded) => {
        if (!encoded) return next();
        const body = encoded[encoding];
        res.setHeader('Content-Encoding', encoding);
        res.setHeader('Vary', 'Accept-Encoding');
        res.setHeader('Content-Length', String(body.length));
        res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        res.type(path.extname(file));
        if (req.method === 'HEAD') res.end();
        else res.end(body);
      }, next);
    });
  };
}
