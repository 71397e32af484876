import express, { type Request, type Response, type Router, type RequestHandler } from 'express';
import type { ZodType } from 'zod';
import { badRequest } from '../errors';
import { zodDetails } from './zod-details';
import { sendJsonAnswer, sendKeptJson } from './json-answers';

/**
 * Who may call a route: 'public' for anyone, else the staff roles allowed,
 * or `['guest']` (GUEST_ONLY in guest-access.ts) for a customer's browser
 * bound to a guest link. Guest and staff roles never share a route.
 */
export type Access = 'public' | readonly string[];

export interface HandlerContext<B = unknown, Q = unknown> {
  body: B;
  query: Q;
  params: Record<string, string>;
  req: Request;
  res: Response;
}

/**
 * One API route. Every route declares `allow`; the table refuses to mount a
 * route without it, so nothing serves by accident (deny by default).
 * A handler returns the JSON to send, or `undefined` when it wrote the
 * response itself (files, streams).
 */
export interface RouteDef {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  allow: Access;
  body?: ZodType;
  query?: ZodType;
  status?: number;
  handler: (ctx: HandlerContext<any, any>) => Promise<unknown> | unknown;
  /** Extra middleware run after the access check (uploads, rate limits). */
  before?: RequestHandler[];
}

/** Checks access for a route; supplied by the auth layer. */
export type AccessGuard = (allow: Access) => RequestHandler;

/** Mounts route definitions on a router: access → extra middleware → validation → handler. */
export function mountRoutes(router: Router, routes: readonly RouteDef[], guard: AccessGuard) {
  const groups = new Map<string, Router>();
  for (const route of routes) {
    if (!route.allow) throw new Error(`Route ${route.method.toUpperCase()} ${route.path} declares no access rule`);
    if (route.allow !== 'public' && route.allow.includes('guest') && route.allow.length !== 1) {
      throw new Error(`Route ${route.method.toUpperCase()} ${route.path} mixes guest access with staff roles`);
    }
    const { on, path } = groupFor(router, groups, route.path);
    on[route.method](path, guard(route.allow), ...(route.before ?? []), async (req, res) => {
      const body = parseWith(route.body, req.body ?? {}, 'body');
      const query = parseWith(route.query, req.query, 'query');
      const result = await route.handler({ body, query, params: req.params as Record<string, string>, req, res });
      if (result === undefined) {
        if (!res.headersSent) res.status(204).end();
        return;
      }
      res.status(route.status ?? 200);
      await sendJson(req, res, result);
    });
  }
}

/** Sends an answer as JSON; a frozen answer (one a service keeps and hands out again) is serialized once (json-answers.ts). */
async function sendJson(req: Request, res: Response, result: unknown) {
  if (typeof result === 'object' && result !== null && Object.isFrozen(result)) sendKeptJson(req, res, result);
  else await sendJsonAnswer(req, res, result);
}

/**
 * Routes are grouped by the first segment of their path (/trees, /walks, …),
 * each group on a router of its own, so a request is matched against its own
 * group's few routes instead of the whole table (Express tries them in turn).
 * Order within a group is the table's order; groups never share a path.
 */
function groupFor(router: Router, groups: Map<string, Router>, fullPath: string): { on: Router; path: string } {
  const first = fullPath.split('/')[1] ?? '';
  if (!first || first.startsWith(':')) return { on: router, path: fullPath };
  let group = groups.get(first);
  if (!group) {
    group = express.Router();
    groups.set(first, group);
    router.use(`/${first}`, group);
  }
  return { on: group, path: fullPath.slice(first.length + 1) || '/' };
}

function parseWith(schema: ZodType | undefined, value: unknown, where: string) {
  if (!schema) return value;
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    throw badRequest(`Some ${where === 'body' ? 'fields' : 'parameters'} need fixing.`, { fields: zodDetails(parsed.error) });
  }
  return parsed.data;
}
