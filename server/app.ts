import express from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Knex } from 'knex';
import type { Config } from './config';
import { createLogger } from './logger';
import { createServices, type Services } from './services';
import { apiRoutes } from './routes';
import { mountRoutes } from './http/route-table';
import { accessGuard } from './http/access';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { mountStaticSite } from './http/static-site';

export interface AppDeps {
  config: Config;
  knex: Knex;
  /** Serve the web build from config.distDir (off in API tests). */
  serveWeb?: boolean;
}

/** Builds the Express app without listening, so tests can drive it directly. */
export function createApp(deps: AppDeps) {
  const { config, knex } = deps;
  const logger = createLogger(config.logLevel);
  const services: Services = createServices({ knex, config });
  const app = express();

  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // react-native-web injects style tags at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.secureCookies ? [] : null,
        },
      },
      strictTransportSecurity: config.secureCookies,
    }),
  );
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));

  const api = express.Router();
  api.use(express.json({ limit: '256kb' }));
  mountRoutes(api, apiRoutes(services), accessGuard);
  api.use(apiNotFound);
  app.use('/api', api);

  if (deps.serveWeb) mountStaticSite(app, config.distDir);
  app.use(errorHandler);
  return { app, services, logger };
}
