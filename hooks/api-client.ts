import { apiErrorSchema } from '@/shared/schemas/api-error';
import { forgetEarlyResponses, takeEarlyResponse } from './early-requests';

/** An API refusal with the server's message and field details. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    /** The whole `details` of the refusal (lists such as validator findings). */
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/**
 * Whether asking again can help: no answer (offline, server down or timed
 * out) or the server failing. A refusal (not signed in, not allowed, not
 * found, bad input, a limit reached) answers the same the next time.
 */
export function canRetry(error: unknown): boolean {
  // No error at all: nothing was asked (an address that names nothing).
  if (!error) return false;
  if (!(error instanceof ApiError)) return true;
  return error.status === 0 || error.status === 408 || error.status >= 500;
}

/**
 * Calls the API on the same origin with the session cookie. Non-2xx answers
 * become ApiError; a network failure becomes ApiError with status 0.
 * `acceptStatuses` lets a caller read a JSON body on a non-2xx answer (health's 503).
 */
export async function api<T>(path: string, init: RequestInit & { json?: unknown; acceptStatuses?: number[] } = {}): Promise<T> {
  const { json, acceptStatuses = [], headers, ...rest } = init;
  const isRead = (rest.method ?? 'GET').toUpperCase() === 'GET' && json === undefined && rest.body == null;
  if (!isRead) forgetEarlyResponses();
  // A read the page started before this code arrived (public/early-requests.js).
  const started = isRead && headers === undefined ? takeEarlyResponse(path) : undefined;
  let res: Response;
  try {
    res = await (started ?? fetch(`/api${path}`, {
      credentials: 'same-origin',
      ...rest,
      headers: {
        Accept: 'application/json',
        ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}),
        // The server's CSRF guard refuses state changes without this header.
        'X-Baywalk-Request': '1',
        ...headers,
      },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    }));
  } catch {
    throw new ApiError(0, 'network', 'Baywalk cannot reach the server. Check the connection and try again.');
  }
  const text = await res.text();
  const body = text ? safeJson(text) : undefined;
  if (res.ok || acceptStatuses.includes(res.status)) return body as T;
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    const details = parsed.data.error.details as { fields?: Record<string, string> } | undefined;
    throw new ApiError(res.status, parsed.data.error.code, parsed.data.error.message, details?.fields ?? {}, parsed.data.error.details);
  }
  throw new ApiError(res.status, 'http', `The server answered ${res.status}. Try again in a moment.`);
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
