/**
 * Answers to API reads started by public/early-requests.js before the app's
 * JavaScript arrived (the session, and the walk on /walks/<id>). Each is
 * handed out once, to the first GET of the same path, and only while it can
 * still describe the present: within EARLY_MAX_AGE_MS of the page starting,
 * and before any write (sign-in, a step…) has been sent.
 */
type EarlyRequests = { startedAt: number; requests: Record<string, Promise<Response> | undefined> };

const EARLY_MAX_AGE_MS = 30_000;

function early(): EarlyRequests | undefined {
  return typeof window === 'undefined' ? undefined : (window as unknown as { __baywalkEarly?: EarlyRequests }).__baywalkEarly;
}

/** The early answer for GET `path` (an API path without /api), once; undefined when there is none. */
export function takeEarlyResponse(path: string): Promise<Response> | undefined {
  const e = early();
  if (!e) return undefined;
  const pending = e.requests[path];
  if (!pending) return undefined;
  delete e.requests[path];
  return Date.now() - e.startedAt <= EARLY_MAX_AGE_MS ? pending : undefined;
}

/** Drops every early answer not yet taken: after a write they may be out of date. */
export function forgetEarlyResponses() {
  const e = early();
  if (e) e.requests = {};
}
