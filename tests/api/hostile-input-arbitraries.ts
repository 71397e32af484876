/// <reference types="node" />
import zlib from 'node:zlib';
import fc from 'fast-check';
import { expect } from 'vitest';
import type { ZodType } from 'zod';

/** One generated request: path parameters, a query string and a body with its headers. */
export interface HostileRequest {
  params: string[];
  query: string;
  body: HostileBody;
  csrf: boolean;
}

export interface HostileBody {
  label: string;
  payload?: string | Buffer;
  contentType?: string;
  encoding?: string;
}

// A stack frame, a source path, a driver error name or raw SQL: none may reach a caller.
const LEAK = /\n\s+at \S|\bat (?:async )?[\w.<>]+ \(|node_modules[\\/]|\/work\/|\.tsx?:\d+:\d+|\bER_[A-Z_]{4,}|sqlMessage|\bsql:|\bselect\s+[`*\w].*\sfrom\s/i;

/** The answer to a hostile request: below 500, no internals, refusals as JSON with a message. */
export function expectSafeAnswer(res: { status: number; text?: string; headers: Record<string, string>; body?: unknown }, where: string) {
  const text = typeof res.text === 'string' ? res.text : '';
  expect(res.status, `${where} → ${res.status} ${text.slice(0, 300)}`).toBeLessThan(500);
  expect(text, where).not.toMatch(LEAK);
  if (res.status >= 400) {
    expect(res.headers['content-type'] ?? '', `${where} → ${res.status}`).toMatch(/^application\/json/);
    const message = (res.body as { error?: { message?: unknown } } | undefined)?.error?.message;
    expect(typeof message === 'string' && message.trim().length > 0, `${where} → ${res.status} ${text.slice(0, 300)}`).toBe(true);
  }
}

const safeEncode = (s: string) => {
  try {
    return encodeURIComponent(s);
  } catch {
    return encodeURIComponent(s.replace(/[\ud800-\udfff]/g, '?'));
  }
};

// Already in URL form: traversal, bad percent-encoding, injection, odd numbers, very long.
const RAW_PARAMS = [
  '..%2F..%2F..%2Fetc%2Fpasswd',
  '%2e%2e%2f%2e%2e%2fpackage.json',
  '..%5C..%5Cwindows%5Cwin.ini',
  '%00',
  'abc%00.jpg',
  '%E0%A4%A',
  '%',
  '%2F',
  '1%20OR%201%3D1',
  '%27%20OR%20%271%27%3D%271',
  '%3Cscript%3Ealert(1)%3C%2Fscript%3E',
  '0',
  '-1',
  '1.5',
  '1e3',
  '0x10',
  '%201',
  '9'.repeat(40),
  '18446744073709551617',
  'NaN',
  'Infinity',
  'null',
  'undefined',
  '__proto__',
  'constructor',
  'a'.repeat(3000),
  '00000000-0000-0000-0000-000000000000',
  '..',
  '.',
];

/** A path parameter: real ids of the shop, numbers, traversal tricks or any text. */
export function paramArb(realIds: string[]): fc.Arbitrary<string> {
  return fc.oneof(
    { arbitrary: fc.constantFrom(...realIds), weight: 5 },
    { arbitrary: fc.constantFrom(...RAW_PARAMS), weight: 4 },
    { arbitrary: fc.integer().map(String), weight: 1 },
    { arbitrary: fc.uuid().map(String), weight: 1 },
    { arbitrary: fc.string({ maxLength: 40, unit: 'binary' }).filter((s) => s.length > 0).map(safeEncode), weight: 3 },
  );
}

/** Fills `:name` parameters (and Express 5 `*splat` / optional `{…}` groups) from the generated values. */
export function fillPath(path: string, params: string[]): string {
  let i = 0;
  return path
    .replace(/[{}]/g, '')
    .replace(/\*\w+/g, () => params[i++ % params.length])
    .replace(/:(\w+)/g, () => params[i++ % params.length]);
}

/** Top-level keys a zod schema reads, found through pipes, unions and wrappers. */
export function schemaKeys(schema: ZodType | undefined, depth = 0): string[] {
  if (!schema || depth > 6) return [];
  const def = (schema as unknown as { _zod?: { def?: Record<string, unknown> } })._zod?.def ?? {};
  switch (def.type) {
    case 'object':
      return Object.keys((def.shape as Record<string, unknown>) ?? {});
    case 'pipe':
      return schemaKeys(def.in as ZodType, depth + 1);
    case 'union':
      return [...new Set((def.options as ZodType[]).flatMap((o) => schemaKeys(o, depth + 1)))];
    case 'intersection':
      return [...schemaKeys(def.left as ZodType, depth + 1), ...schemaKeys(def.right as ZodType, depth + 1)];
    default:
      return def.innerType ? schemaKeys(def.innerType as ZodType, depth + 1) : [];
  }
}

// Values of every wrong type, plus the edges numbers and strings are judged at.
const oddValue = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.constantFrom(
    null,
    true,
    '',
    ' ',
    'x'.repeat(5000),
    -1,
    0,
    1.5,
    1e308,
    -1e308,
    Number.MAX_SAFE_INTEGER + 2,
    '1',
    '2026-13-45',
    'answer.yes',
    { type: 'reading', value: '18' },
    { type: 'answer.' + 'x'.repeat(500) },
    ['a'],
    {},
    { $gt: '' },
    "'; DROP TABLE walks; --",
    '\u0000',
    '\ud800',
  ),
);

/** Values that fit many fields, so some generated bodies pass validation and reach the services. */
function plausibleValue(realIds: string[]) {
  return fc.oneof(
    fc.constantFrom(...realIds.map(Number)),
    fc.uuid().map(String),
    fc.constantFrom(
      'Kestrel Test',
      'someone@shop.example',
      'correct horse battery',
      'tech',
      'fixed',
      'intake_manifold',
      'inHg',
      'lean_after_intake',
      { type: 'reading', value: 18, unit: '%' },
      { type: 'answer.hose-off' },
      { type: 'done' },
      [{ type: 'intake_manifold', text: 'Ported manifold' }],
      1500,
      'A'.repeat(43),
    ),
  );
}

const json = (v: unknown) => JSON.stringify(v) ?? 'null';
const jsonBody = (label: string, payload: string, contentType = 'application/json'): HostileBody => ({ label, payload, contentType });

/** A body aimed at a route: wrong-typed fields under the schema's own keys, malformed or oversized JSON, content-type tricks. */
/**
 * Bodies known to pass validation for some routes (by "METHOD path"); the
 * generator corrupts one field at a time so requests get past the schema and
 * into the services. Routes not listed get schema-keyed bodies only.
 */
export type ValidExamples = Record<string, Record<string, unknown>>;

function corruptedArb(example: Record<string, unknown>, fieldValue: fc.Arbitrary<unknown>): fc.Arbitrary<HostileBody> {
  const keys = Object.keys(example);
  return fc
    .tuple(fc.constantFrom(...keys), fc.oneof(fieldValue.map((v) => ({ set: v })), fc.constant({ drop: true }), fc.constant({ keep: true })), fc.uuid())
    .map(([key, change, uuid]) => {
      // Fresh ids where the example has one, so retried step ids do not all collide.
      const body: Record<string, unknown> = Object.fromEntries(Object.entries(example).map(([k, v]) => [k, k === 'stepId' ? uuid : v]));
      if ('drop' in change) delete body[key];
      else if ('set' in change) body[key] = change.set;
      return jsonBody('keep' in change ? 'valid example' : `valid but ${key} corrupted`, json(body));
    });
}

export function bodyArb(schema: ZodType | undefined, realIds: string[], example?: Record<string, unknown>): fc.Arbitrary<HostileBody> {
  const keys = schemaKeys(schema);
  const fieldValue = fc.oneof(oddValue, plausibleValue(realIds));
  const keyed = keys.length
    ? fc
        .dictionary(fc.constantFrom(...keys), fieldValue, { maxKeys: keys.length })
        .chain((known) => fc.dictionary(fc.string({ maxLength: 12 }), oddValue, { maxKeys: 3 }).map((extra) => ({ ...extra, ...known })))
    : fc.dictionary(fc.string({ maxLength: 12 }), oddValue, { maxKeys: 5 });
  return fc.oneof(
    { arbitrary: example ? corruptedArb(example, fieldValue) : keyed.map((o) => jsonBody('wrong-typed fields', json(o))), weight: example ? 6 : 1 },
    { arbitrary: fc.constant<HostileBody>({ label: 'no body' }), weight: 1 },
    { arbitrary: keyed.map((o) => jsonBody('wrong-typed fields', json(o))), weight: 8 },
    { arbitrary: fc.jsonValue({ maxDepth: 4 }).map((v) => jsonBody('any JSON value', json(v))), weight: 3 },
    { arbitrary: fc.string({ maxLength: 60 }).map((s) => jsonBody('malformed JSON', `{${s}`)), weight: 2 },
    {
      arbitrary: fc.constantFrom(
        jsonBody('truncated', '{"email": "a@b.c", "password":'),
        jsonBody('lone surrogate', '{"name":"\\ud800"}'),
        jsonBody('prototype pollution', '{"__proto__":{"isAdmin":true},"constructor":{"prototype":{"role":"owner"}}}'),
        jsonBody('deep nesting', '['.repeat(4000) + ']'.repeat(4000)),
        jsonBody('deep object', '{"a":'.repeat(3000) + '1' + '}'.repeat(3000)),
        jsonBody('oversized (300 KB)', json({ note: 'x'.repeat(300 * 1024) })),
        jsonBody('oversized (3 MB)', json({ items: Array.from({ length: 3000 }, () => 'y'.repeat(1000)) })),
        jsonBody('JSON as text/plain', '{"email":"a@b.c"}', 'text/plain'),
        jsonBody('form-encoded', 'email=a%40b.c&password=x&role=owner', 'application/x-www-form-urlencoded'),
        jsonBody('fake multipart', '--x\r\nContent-Disposition: form-data; name="photo"; filename="../../a.jpg"\r\n\r\nhi\r\n--x--', 'multipart/form-data; boundary=x'),
        jsonBody('multipart without boundary', 'hello', 'multipart/form-data'),
        jsonBody('utf-16 charset', '{"a":1}', 'application/json; charset=utf-16'),
        jsonBody('unknown charset', '{"a":1}', 'application/json; charset=klingon'),
        jsonBody('xml', '<?xml version="1.0"?><!DOCTYPE a [<!ENTITY x SYSTEM "file:///etc/passwd">]><a>&x;</a>', 'application/xml'),
        jsonBody('json with vendor type', '{"a":1}', 'application/vnd.api+json'),
        { label: 'gzip header, plain bytes', payload: '{"a":1}', contentType: 'application/json', encoding: 'gzip' },
        { label: 'gzip bomb-ish', payload: zlib.gzipSync(Buffer.alloc(2 * 1024 * 1024, 0x20)), contentType: 'application/json', encoding: 'gzip' },
        { label: 'unknown encoding', payload: '{"a":1}', contentType: 'application/json', encoding: 'br' },
        { label: 'binary bytes', payload: Buffer.from([0xff, 0xd8, 0xff, 0x00, 0x7b, 0x22]), contentType: 'application/json' },
      ),
      weight: 4,
    },
  );
}

/** A query string: the schema's own keys and random ones, repeated (arrays), bracketed or very long. */
export function queryArb(schema: ZodType | undefined): fc.Arbitrary<string> {
  const keys = [...schemaKeys(schema), 'q', 'id', '__proto__', 'constructor[prototype][x]', 'a[b][c]', 'page[]'];
  const key = fc.oneof(fc.constantFrom(...keys), fc.string({ maxLength: 10 }).map(safeEncode));
  const value = fc.oneof(
    fc.string({ maxLength: 30, unit: 'binary' }).map(safeEncode),
    fc.constantFrom('', '%', '%E0%A4%A', '-1', '1e999', 'x'.repeat(4000), '%00', '[]', '{}', 'true'),
  );
  return fc.array(fc.tuple(key, value), { maxLength: 6 }).map((pairs) => (pairs.length ? `?${pairs.map(([k, v]) => `${k}=${v}`).join('&')}` : ''));
}
