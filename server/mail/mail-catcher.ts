import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';

export interface MailCatcher {
  port: number;
  dir: string;
  close(): Promise<void>;
}

/**
 * A local SMTP server that keeps every message it receives as an .eml file in
 * `dir` (oldest name first), so any server process can list caught mail.
 * Loopback only, no TLS, any (or no) login: for development and tests, never
 * production.
 */
export async function startMailCatcher(options: { port: number; dir: string; host?: string }): Promise<MailCatcher> {
  fs.mkdirSync(options.dir, { recursive: true });
  const server = new SMTPServer({
    secure: false,
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    logger: false,
    banner: 'Baywalk local mail catcher',
    size: 10 * 1024 * 1024,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'catcher' });
    },
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('error', callback);
      stream.on('end', () => {
        const name = `${Date.now().toString().padStart(15, '0')}-${crypto.randomBytes(4).toString('hex')}.eml`;
        const tmp = path.join(options.dir, `.${name}.tmp`);
        // Write then rename, so a reader never sees half a message.
        fs.promises
          .writeFile(tmp, Buffer.concat(chunks))
          .then(() => fs.promises.rename(tmp, path.join(options.dir, name)))
          .then(() => callback(), callback);
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host ?? '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    port,
    dir: options.dir,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
