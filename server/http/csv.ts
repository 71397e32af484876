import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Response } from 'express';

/** One CSV column: its heading and how to read its value from a row. */
export interface CsvColumn<R> {
  header: string;
  value: (row: R) => unknown;
}

// A spreadsheet runs a cell starting with one of these as a formula; tab and CR too (OWASP "CSV injection").
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * One value as a CSV field (RFC 4180): quoted when it holds a comma, quote or
 * line break, quotes doubled. Text that a spreadsheet would run as a formula
 * gets a leading apostrophe; numbers stay numbers (a negative trim is data).
 */
export function csvField(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  let text = value instanceof Date ? value.toISOString() : String(value);
  if (FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) || text !== text.trim() ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A CSV record with its CRLF line end. */
export function csvLine(values: readonly unknown[]): string {
  return `${values.map(csvField).join(',')}\r\n`;
}

/** A file name safe in a Content-Disposition header. */
export function safeFilename(name: string): string {
  return name.replace(/[^A-Za-z0-9._-]+/g, '-').slice(0, 120) || 'export.csv';
}

/**
 * Streams rows to the response as a CSV download, with backpressure: rows
 * leave the database as the client reads them, and a client that goes away
 * stops the query. The first row is read before anything is sent, so a query
 * that fails at once is thrown (the error handler answers in JSON); a failure
 * later cuts the connection, so a half file is never taken for a whole one.
 */
export async function sendCsv<R>(res: Response, filename: string, rows: Readable, columns: readonly CsvColumn<R>[]): Promise<void> {
  const source = rows[Symbol.asyncIterator]() as AsyncIterator<R>;
  let first: IteratorResult<R>;
  try {
    first = await source.next();
  } catch (err) {
    rows.destroy();
    throw err;
  }
  res.status(200);
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${safeFilename(filename)}"`);
  res.setHeader('Cache-Control', 'private, no-store');
  res.setHeader('X-Content-Type-Options', 'nosniff');
  const line = (row: R) => csvLine(columns.map((c) => c.value(row)));
  async function* text() {
    yield csvLine(columns.map((c) => c.header));
    for (let next = first; !next.done; next = await source.next()) yield line(next.value);
  }
  try {
    await pipeline(Readable.from(text(), { objectMode: false }), res);
  } catch (err) {
    (res.req as { log?: { warn: (o: unknown, m: string) => void } }).log?.warn({ err }, 'CSV export stopped before the end');
    res.destroy();
  } finally {
    rows.destroy();
  }
}
