import type { Config } from '../config';
import { startMailCatcher, type MailCatcher } from './mail-catcher';

/**
 * Starts the development mail catcher inside the server process when the
 * configuration asks for it. When the port is already taken, another Baywalk
 * process on this machine runs one and writes to the same folder, so this
 * process uses that one.
 */
export async function startLocalCatcher(config: Config, log: (message: string) => void): Promise<MailCatcher | undefined> {
  if (!config.mailCatcher) return undefined;
  try {
    const catcher = await startMailCatcher({ port: config.smtp.port, dir: config.mailDir });
    log(`mail catcher on 127.0.0.1:${catcher.port}; caught mail at http://${config.host}:${config.port}/dev/mail`);
    return catcher;
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      log(`port ${config.smtp.port} already has a mail catcher (another Baywalk process); using it`);
      return undefined;
    }
    throw err;
  }
}
