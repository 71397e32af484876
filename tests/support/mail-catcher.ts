/// <reference types="node" />
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { loadConfig } from '@/server/config';
import { startMailCatcher } from '@/server/mail/mail-catcher';
import { caughtMailIds } from '@/server/mail/caught-mail';

/**
 * A private SMTP catcher for one test file: a free loopback port and its own
 * folder. Pass `appConfig()` to createTestApp so the app's mailer sends here.
 */
export async function startTestMailCatcher() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'baywalk-mail-'));
  const catcher = await startMailCatcher({ port: 0, dir });
  const base = loadConfig();
  return {
    port: catcher.port,
    dir,
    /** Config overrides that point the app's mailer and mail page at this catcher. */
    appConfig: () => ({ smtp: { ...base.smtp, host: '127.0.0.1', port: catcher.port }, mailDir: dir }),
    /** Every caught message to an address, oldest first, parsed. */
    async mailTo(address: string): Promise<ParsedMail[]> {
      const all = await Promise.all(caughtMailIds(dir).reverse().map((id) => fs.promises.readFile(path.join(dir, `${id}.eml`)).then((raw) => simpleParser(raw))));
      return all.filter((m) => addresses(m).includes(address.toLowerCase()));
    },
    /** Waits for the `count`-th message to an address (mail may go out after the HTTP answer). */
    async waitForMail(address: string, count = 1, timeoutMs = 10_000): Promise<ParsedMail> {
      const until = Date.now() + timeoutMs;
      for (;;) {
        const found = await this.mailTo(address);
        if (found.length >= count) return found[count - 1];
        if (Date.now() > until) throw new Error(`no mail #${count} to ${address} within ${timeoutMs} ms (caught ${found.length})`);
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    async close() {
      await catcher.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

function addresses(m: ParsedMail): string[] {
  const to = Array.isArray(m.to) ? m.to : m.to ? [m.to] : [];
  return to.flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase()));
}

/** The link in a mail's text part that leads to `screen` (e.g. '/accept-invite'), and its token. */
export function linkFrom(mail: ParsedMail, screen: string): { url: URL; token: string } {
  const match = (mail.text ?? '').match(new RegExp(`https?://\\S+${screen.replace('/', '\\/')}\\?token=[A-Za-z0-9_%-]+`));
  if (!match) throw new Error(`no ${screen} link in mail "${mail.subject}"`);
  const url = new URL(match[0]);
  return { url, token: url.searchParams.get('token') ?? '' };
}
