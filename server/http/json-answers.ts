/// <reference types="node" />
import crypto from 'node:crypto';
import zlib from 'node:zlib';
import { promisify } from 'node:util';
import type { Request, Response } from 'express';
import { preferredEncoding } from './content-encoding';

/**
 * How API answers go out as JSON. Browsers get answers of some size
 * compressed (Brotli, else gzip): a walk is about 30 KB, a fifth of that
 * compressed, on a bay's weak signal. Smaller answers (a step's answer) are not
 * worth the work on every request.
 */
const COMPRESS_FROM_BYTES = 4096;

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

/** Brotli at quality 5 and gzip at level 6: most of the saving for little work. */
const brotliOptions = (bytes: Buffer) => ({ params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 5, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: bytes.length } });
const GZIP_OPTIONS = { level: 6 };

/** Sends an answer made for this request: compressed when large enough and the browser takes it. */
export async function sendJsonAnswer(req: Request, res: Response, answer: unknown) {
  const text = Buffer.from(JSON.stringify(answer));
  const encoding = text.length >= COMPRESS_FROM_BYTES ? preferredEncoding(req) : undefined;
  res.type('json').vary('Accept-Encoding');
  if (!encoding) {
    res.send(text);
    return;
  }
  // Off the main thread: an answer made for one request is compressed once.
  const body = encoding === 'br' ? await brotli(text, brotliOptions(text)) : await gzip(text, GZIP_OPTIONS);
  res.set('Content-Encoding', encoding).send(body);
}

interface Kept {
  body: Buffer;
  etag: string;
}

// Text and ETag of each frozen answer, for as long as the service keeps handing that object out.
const bodies = new WeakMap<object, Kept>();
// Compressed copies by ETag (the same text, compressed once), the most recently used kept.
const compressed = new Map<string, { br: Buffer; gzip: Buffer }>();
const MAX_COMPRESSED = 200;

function keptBody(answer: object): Kept {
  let kept = bodies.get(answer);
  if (!kept) {
    const body = Buffer.from(JSON.stringify(answer));
    kept = { body, etag: `"${crypto.createHash('sha1').update(body).digest('base64url')}"` };
    bodies.set(answer, kept);
  }
  return kept;
}

function compressedCopies({ body, etag }: Kept) {
  let hit = compressed.get(etag);
  if (hit) {
    compressed.delete(etag);
  } else {
    // Once per content, in line with the request that first needs it.
    hit = { br: zlib.brotliCompressSync(body, brotliOptions(body)), gzip: zlib.gzipSync(body, GZIP_OPTIONS) };
    if (compressed.size >= MAX_COMPRESSED) compressed.delete(compressed.keys().next().value!);
  }
  compressed.set(etag, hit);
  return hit;
}

/**
 * Sends a frozen answer: it cannot change, so its JSON text, its ETag and its
 * compressed copies are made once and reused for every request it answers.
 * A matching If-None-Match gets 304; a client that takes Brotli or gzip (every
 * browser) gets the compressed copy, a fifth of the size of a tree page.
 */
export function sendKeptJson(req: Request, res: Response, answer: object) {
  const kept = keptBody(answer);
  // A signed-in person's answer: their browser may keep it but must ask again each time; shared caches never keep it.
  res.type('json').set('ETag', kept.etag).set('Cache-Control', 'private, no-cache').vary('Accept-Encoding');
  if (req.fresh) {
    res.status(304).end();
    return;
  }
  // Made once per content, so even small kept answers are worth compressing.
  const encoding = kept.body.length < 1024 ? undefined : preferredEncoding(req);
  if (!encoding) {
    res.send(kept.body);
    return;
  }
  const body = compressedCopies(kept)[encoding];
  res.set('Content-Encoding', encoding).set('Content-Length', String(body.length));
  res.end(req.method === 'HEAD' ? undefined : body);
}
