import type { Request } from 'express';

/**
 * The compression a browser takes for a response: Brotli whenever it lists
 * it (browsers list gzip first at equal weight), else gzip, else none. Used
 * by every place that sends compressed bytes: built files, the page, JSON.
 */
export function preferredEncoding(req: Request): 'br' | 'gzip' | undefined {
  return req.acceptsEncodings('br') === 'br' ? 'br' : req.acceptsEncodings('gzip') === 'gzip' ? 'gzip' : undefined;
}
