import fs from 'node:fs';
import path from 'node:path';

/** A caught message as the development mail page lists it. */
export interface CaughtMail {
  id: string;
  receivedAt: Date;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | undefined;
}

const ID = /^\d{15}-[0-9a-f]{8}$/;

/** Ids of caught messages, newest first. */
export function caughtMailIds(dir: string): string[] {
  let names: string[];
  try {
    names = fs.readdirSync(dir);
  } catch {
    return [];
  }
  return names
    .filter((n) => n.endsWith('.eml'))
    .map((n) => n.slice(0, -4))
    .filter((id) => ID.test(id))
    .sort()
    .reverse();
}

/**
 * Reads and parses one caught message; undefined for an unknown or malformed id.
 * mailparser is a development dependency, so it is loaded only here (the
 * page using this is never mounted in production).
 */
export async function readCaughtMail(dir: string, id: string): Promise<CaughtMail | undefined> {
  if (!ID.test(id)) return undefined;
  let raw: Buffer;
  try {
    raw = await fs.promises.readFile(path.join(dir, `${id}.eml`));
  } catch {
    return undefined;
  }
  const { simpleParser } = await import('mailparser');
  const parsed = await simpleParser(raw);
  const addresses = (v: typeof parsed.to) => (Array.isArray(v) ? v.map((a) => a.text).join(', ') : (v?.text ?? ''));
  return {
    id,
    receivedAt: new Date(Number(id.slice(0, 15))),
    from: parsed.from?.text ?? '',
    to: addresses(parsed.to),
    subject: parsed.subject ?? '(no subject)',
    text: parsed.text ?? '',
    html: typeof parsed.html === 'string' ? parsed.html : undefined,
  };
}
