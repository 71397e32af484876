/// <reference types="node" />
import crypto from 'node:crypto';
import zlib from 'node:zlib';
import type { Request, Response } from 'express';

interface Kept {
  body: Buffer;
  etag: string;
}

// Text and ETag of each frozen answer, for as long as the service keeps handing that object out.
const bodies = new WeakMap<object, Kept>();
// Compressed copies by ETag (the same text, compressed once), the most recently used kept.
const compressed = new Map<string, { br: Buffer; gzip: Buffer }>();
const MAX_COMPRESSED = 200;
// Below this a compressed body saves less than the work of compressing and the header it needs.
const MIN_COMPRESS_BYTES = 1024;

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
    // Moderate settings: a page is compressed once per content, in line with a request.
    hit = {
      br: zlib.brotliCompressSync(body, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 6, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: body.length } }),
      gzip: zlib.gzipSync(body, { level: 6 }),
    };
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
  const encoding = kept.body.length < MIN_COMPRESS_BYTES ? undefined : req.acceptsEncodings('br') === 'br' ? 'br' : req.acceptsEncodings('gzip') === 'gzip' ? 'gzip' : undefined;
  if (!encoding) {
    res.send(kept.body);
    return;
  }
  const body = compressedCopies(kept)[encoding];
  res.set('Content-Encoding', encoding).set('Content-Length', String(body.length));
  res.end(req.method === 'HEAD' ? undefined : body);
}
