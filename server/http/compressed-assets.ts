/// <reference types="node" />
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { promisify } from 'node:util';
import type { RequestHandler } from 'express';
import { preferredEncoding } from './content-encoding';

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

/** The hashed folders of the build, the only ones served compressed. */
const HASHED_DIRS = ['_expo/static', 'assets'];

/** Every file of a folder, recursively. */
async function filesUnder(dir: string): Promise<string[]> {
  const entries = await fs.promises.readdir(dir, { withFileTypes: true }).catch(() => []);
  const nested = await Promise.all(entries.map((e) => (e.isDirectory() ? filesUnder(path.join(dir, e.name)) : [path.join(dir, e.name)])));
  return nested.flat();
}

/**
 * Writes `<file>.br` (Brotli at its best quality, about 8% smaller than the
 * quality a request can afford) and `<file>.gz` beside every compressible
 * hashed file of a fresh build; compressedAssets sends them as they are.
 * Run by scripts/build-web.sh. Returns how many files it compressed.
 */
export async function precompress(distDir: string): Promise<number> {
  const files = (await Promise.all(HASHED_DIRS.map((d) => filesUnder(path.join(distDir, d))))).flat();
  let written = 0;
  await Promise.all(
    files.filter((f) => COMPRESSIBLE.test(f)).map(async (file) => {
      const data = await fs.promises.readFile(file);
      if (data.length < MIN_BYTES) return;
      const [br, gz] = await Promise.all([
        brotli(data, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length } }),
        gzip(data, { level: 9 }),
      ]);
      await Promise.all([fs.promises.writeFile(`${file}.br`, br), fs.promises.writeFile(`${file}.gz`, gz)]);
      written += 1;
    }),
  );
  return written;
}

/**
 * Serves the web build's hashed files (dist/_expo/static, dist/assets)
 * compressed: Brotli when the browser takes it, else gzip. JavaScript
 * compresses to about a fifth, which is what a phone on a mobile network
 * waits for. The build writes the compressed copies (precompress); a file
 * without them is compressed once, on its first request. Either way they are
 * kept in memory: hashed file names never change content. Anything else falls
 * through to express.static.
 */
export function compressedAssets(distDir: string): RequestHandler {
  const root = path.resolve(distDir);
  const cache = new Map<string, Promise<Encoded | null>>();

  // The build's own .br/.gz when it made them (precompress), else compressed here.
  const readPrecompressed = (file: string): Promise<Encoded | null> =>
    Promise.all([fs.promises.readFile(`${file}.br`), fs.promises.readFile(`${file}.gz`)]).then(
      ([br, gz]) => ({ br, gzip: gz }),
      () => null,
    );

  const compressNow = (file: string): Promise<Encoded | null> =>
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

  const encode = (file: string): Promise<Encoded | null> =>
    readPrecompressed(file).then((ready) => ready ?? compressNow(file));

  return (req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !COMPRESSIBLE.test(req.path)) return next();
    if (!req.path.startsWith('/_expo/static/') && !req.path.startsWith('/assets/')) return next();
    // Brotli whenever the browser lists it (browsers list gzip first at equal weight), else gzip.
    const encoding = preferredEncoding(req);
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
