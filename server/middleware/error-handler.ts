import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError, translateError } from '../errors';

/** The one place errors become JSON. Unknown errors are logged, never shown. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = translateError(err);
  if (known) {
    res.status(known.status).json({ error: { code: known.code, message: known.message, details: known.details } });
    return;
  }
  req.log?.error({ err }, 'unhandled error');
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Nothing you saved was lost; try again.' } });
};

/** JSON 404 for API paths no route answers. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'no_such_route', `There is no API route ${req.method} ${req.path}.`));
};
