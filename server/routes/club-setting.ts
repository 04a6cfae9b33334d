import { Router, type RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import type { ClubScope } from '../services/club-scope';
import { scopeOf } from './scoped';

/** A club-wide setting a service keeps for the caller's club. */
export interface ClubSetting<T> {
  get(): Promise<T>;
  set(change: Partial<T>): Promise<T>;
}

/**
 * GET and PUT `/club/<name>` for one club-wide setting: everyone in the caller's club reads it;
 * the head of coaching changes it, with the body checked against the `body` schema. The answer to
 * both is the whole setting as stored. `service` builds the setting's service for one request.
 */
export function clubSettingRouter<T>(
  name: string,
  body: string,
  service: (scope: ClubScope) => ClubSetting<T>,
  { dataSource, requireAuth }: { dataSource: DataSource; requireAuth: RequestHandler },
): Router {
  const router = Router();
  router.get(`/club/${name}`, requireAuth, async (req, res) => {
    res.json(await service(scopeOf(req, dataSource)).get());
  });
  router.put(`/club/${name}`, requireAuth, requireRole('lead'), validate({ body }), async (req, res) => {
    res.json(await service(scopeOf(req, dataSource)).set(req.body as Partial<T>));
  });
  return router;
}
