import type { Request, Response } from 'express';
import { WORKSHOP, type Role } from '@/shared/roles';
import { walkPageId } from '@/shared/walk-paths';
import type { Services } from '../services';
import type { SessionUser } from './access';
import { walkFirstPaint } from './walk-first-paint';

/**
 * What the page for a request carries drawn ahead (walk-first-paint.ts): a
 * walk's current step for a signed-in person who may read the walk (the rule
 * of `GET /api/walks/:id`), while it is open. Anything else, including any
 * failure, is the plain page: the app then loads the walk as usual.
 */
export function walkPagePaint(services: Services, withSession: (req: Request, res: Response) => Promise<void>) {
  return async (req: Request, res: Response): Promise<string> => {
    const id = walkPageId(req.path);
    if (id === undefined || !req.headers.cookie) return '';
    await withSession(req, res);
    const user = req.user as SessionUser | undefined;
    if (!user || !WORKSHOP.includes(user.role as Role)) return '';
    const [me, walk] = await Promise.all([services.auth.me(user.id), services.walks.get(user.shopId, id)]);
    return walk.walk.status === 'open' ? walkFirstPaint(me, walk) : '';
  };
}
