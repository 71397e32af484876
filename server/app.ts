import express, { type Request, type RequestHandler, type Response } from 'express';
import type { PassportStatic } from 'passport';
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
import { walkPagePaint } from './http/walk-page-paint';
import { mountDevMail } from './routes/dev-mail-routes';
import { sessionMiddleware } from './auth/session';
import { createPassport } from './auth/passport-setup';
import { csrfGuard } from './http/csrf';

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
  if (logger.isLevelEnabled('info')) {
    app.use(
      pinoHttp({
        logger,
        autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
        // One short line per request: no headers, so no cookies in the log.
        serializers: {
          req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
          res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
        },
      }),
    );
  } else {
    // Request lines would not be written at this level: skip pino-http's per-request work, keep req.log for errors.
    app.use((req, _res, next) => {
      req.log = logger;
      next();
    });
  }

  const passport = createPassport(knex);
  const api = express.Router();
  api.use(express.json({ limit: '256kb' }));
  api.use(csrfGuard);
  // Health answers even when the session store (the database) is down. `compat: false`: no passport 0.4
  // strategies here, so none of the per-request properties kept for them.
  const withSession = [sessionMiddleware(knex, config), passport.initialize({ compat: false }), passport.session()];
  api.use((req, res, next) => (req.path === '/health' ? next() : runAll(withSession, req, res, next)));
  mountRoutes(api, apiRoutes(services, passport as unknown as PassportStatic), accessGuard);
  api.use(apiNotFound);
  app.use('/api', api);

  // The caught-mail pages exist only outside production.
  if (!config.production) mountDevMail(app, config.mailDir);
  if (deps.serveWeb) {
    // A walk's page comes with its step drawn (server/http/walk-page-paint.ts): the same session check as the API.
    const session = (req: Request, res: Response) => new Promise<void>((resolve) => runAll(withSession, req, res, () => resolve()));
    mountStaticSite(app, config.distDir, walkPagePaint(services, session));
  }
  app.use(errorHandler);
  return { app, services, logger };
}

/** Runs middleware in order, stopping at the first error. */
function runAll(chain: RequestHandler[], req: Parameters<RequestHandler>[0], res: Parameters<RequestHandler>[1], done: (err?: unknown) => void) {
  let i = 0;
  const step = (err?: unknown) => {
    if (err || i === chain.length) return done(err);
    chain[i++](req, res, step);
  };
  step();
}
