import { describe, expect, it } from 'vitest';
import { ApiError, canRetry } from './api-client';

describe('canRetry', () => {
  it('offers asking again when no answer came or the server failed', () => {
    expect(canRetry(new ApiError(0, 'network', 'No connection'))).toBe(true);
    expect(canRetry(new TypeError('Failed to fetch'))).toBe(true);
    // RFC 9110 §15.5.9 (408: the server timed out waiting) and §15.6 (5xx: the server failed a valid request).
    expect(canRetry(new ApiError(408, 'timeout', 'Too slow'))).toBe(true);
    expect(canRetry(new ApiError(500, 'internal', 'Broke'))).toBe(true);
    expect(canRetry(new ApiError(503, 'database_unavailable', 'The database is not answering'))).toBe(true);
  });

  it('does not offer it for a refusal, which answers the same the next time', () => {
    // RFC 9110 §15.5: 4xx means the request itself is refused as sent.
    for (const status of [400, 401, 403, 404, 409, 413, 422, 429]) expect(canRetry(new ApiError(status, 'refused', 'No'))).toBe(false);
    // Nothing asked at all: an address that names nothing.
    expect(canRetry(undefined)).toBe(false);
    expect(canRetry(null)).toBe(false);
  });
});
