/// <reference types="node" />
import { loadConfig } from './config';
import { openDatabase } from './db';
import { createApp } from './app';
import { startLocalCatcher } from './mail/local-catcher';

/** Starts the HTTP server; Ctrl-C or SIGTERM close it cleanly. */
async function main() {
  const config = loadConfig();
  if (config.production && !config.publicUrl) {
    console.error('baywalk: set BAYWALK_PUBLIC_URL (the address people use, e.g. https://baywalk.example.com) so e-mailed links point there');
    process.exit(1);
  }
  const catcher = await startLocalCatcher(config, (m) => console.log(`baywalk: ${m}`));
  const knex = openDatabase(config.db);
  const { app, logger } = createApp({ config, knex, serveWeb: true });
  const server = app.listen(config.port, config.host);
  server.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EADDRINUSE') {
      console.error(`baywalk: port ${config.port} on ${config.host} is taken by another program; set PORT to a free port`);
    } else {
      console.error(`baywalk: the server could not start: ${err.message}`);
    }
    process.exit(1);
  });
  server.on('listening', () => {
    logger.info({ port: config.port }, 'listening');
    process.send?.('listening');
  });

  let closing = false;
  const stop = () => {
    if (closing) return;
    closing = true;
    void catcher?.close();
    server.close(() => void knex.destroy().finally(() => process.exit(0)));
    server.closeAllConnections?.();
    (setTimeout(() => process.exit(0), 3000) as unknown as NodeJS.Timeout).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

void main();
