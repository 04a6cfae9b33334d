import { Router, type RequestHandler } from 'express';
import { authOf } from '../http/auth-context';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';

/** A club-wide setting a service keeps, read and changed for one club. */
export interface ClubSetting<T> {
  get(clubId: string): Promise<T>;
  set(clubId: string, change: Partial<T>): Promise<T>;
}

/**
 * GET and PUT `/club/<name>` for one club-wide setting: everyone in the caller's club reads it;
 * the head of coaching changes it, with the body checked against the `body` schema. The answer to
 * both is the whole setting as stored.
 */
export function clubSettingRouter<T>(
  name: string,
  body: string,
  service: ClubSetting<T>,
  requireAuth: RequestHandler,
): Router {
  const router = Router();
  router.get(`/club/${name}`, requireAuth, async (req, res) => {
    res.json(await service.get(authOf(req).clubId));
  });
  router.put(`/club/${name}`, requireAuth, requireRole('lead'), validate({ body }), async (req, res) => {
    res.json(await service.set(authOf(req).clubId, req.body as Partial<T>));
  });
  return router;
}
