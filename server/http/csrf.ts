import type { RequestHandler } from 'express';
import { AppError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
export const CSRF_HEADER = 'x-baywalk-request';

/**
 * Cross-site request forgery guard for state-changing API calls:
 * the request must carry the custom header (a cross-site page cannot add one
 * without a CORS preflight, which this API never grants), and when the browser
 * names an Origin it must be this server's own.
 */
export const csrfGuard: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const origin = req.get('origin');
  const site = req.get('sec-fetch-site');
  const ownOrigin = `${req.protocol}://${req.get('host')}`;
  if (req.get(CSRF_HEADER) !== '1' || (origin && origin !== ownOrigin) || (site && site !== 'same-origin' && site !== 'none')) {
    return next(new AppError(403, 'cross_site_refused', 'This request did not come from Baywalk itself, so it was refused. Reload the page and try again.'));
  }
  next();
};
