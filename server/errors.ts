/** An error meant for the person using the API: status, code and a plain message. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (message: string, details?: unknown) => new AppError(400, 'bad_request', message, details);
export const unauthenticated = (message = 'Please sign in first.') => new AppError(401, 'unauthenticated', message);
export const forbidden = (message = 'Your role does not allow this.') => new AppError(403, 'forbidden', message);
export const notFound = (what = 'That record') => new AppError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, details?: unknown) => new AppError(409, 'conflict', message, details);
export const tooMany = (message: string) => new AppError(429, 'rate_limited', message);
export const databaseUnavailable = () =>
  new AppError(503, 'database_unavailable', 'The database is not answering right now. Your saved work is safe; try again in a moment.');

// MariaDB error numbers (match on errno: names differ between MariaDB and MySQL).
const CONNECTION_ERRNOS = new Set([2002, 2003, 2006, 2013, 1040, 1053, 1927, 4031]);
const CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'PROTOCOL_CONNECTION_LOST', 'ETIMEDOUT', 'EPIPE']);

/** Turns driver and library errors into AppErrors; the one place that knows driver codes. */
export function translateError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  const e = err as { errno?: number; code?: string; name?: string; message?: string; type?: string; status?: number; fatal?: boolean };
  if (!e || typeof e !== 'object') return undefined;
  // mysql2 marks errors that killed the connection `fatal` (e.g. a ROLLBACK on a connection the server
  // dropped: "Can't add new command when connection is in closed state"); they carry no errno.
  if (e.name === 'KnexTimeoutError' || e.fatal === true || (e.code && CONNECTION_CODES.has(e.code)) || (e.errno && CONNECTION_ERRNOS.has(e.errno))) {
    return databaseUnavailable();
  }
  // Deadlock or lock wait timeout: the database rolled the transaction back, so nothing was saved; a retry is safe.
  if (e.errno === 1213 || e.errno === 1205) {
    return new AppError(503, 'busy', 'Baywalk was too busy to save this just now. Nothing from this request was saved; try again in a moment.');
  }
  if (e.errno === 1062) return conflict('A record with these values already exists.');
  if (e.errno === 1451 || e.errno === 1452) return conflict('This record is linked to others and cannot be changed that way.');
  if (e.errno === 1406) return badRequest('A value is longer than the field allows.');
  // body-parser errors carry a 4xx status and a type.
  if (e.type === 'entity.too.large') return new AppError(413, 'too_large', 'The request body is too large.');
  if (e.type === 'entity.parse.failed') return badRequest('The request body is not valid JSON.');
  if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
    return new AppError(e.status, 'bad_request', 'The request could not be read.');
  }
  return undefined;
}
