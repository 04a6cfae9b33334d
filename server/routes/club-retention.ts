import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { RetentionService } from '../services/retention-service';
import type { ApiDeps } from './api-deps';

/**
 * /club/retention: how many seasons the caller's club keeps plans, attendance and feedback.
 * Everyone in the club reads it; the head of coaching changes it.
 */
export function clubRetentionRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const service = new RetentionService(dataSource);

  router.get('/club/retention', requireAuth, async (req, res) => {
    res.json(await service.get(authOf(req).clubId));
  });
  router.put(
    '/club/retention',
    requireAuth,
    requireRole('lead'),
    validate({ body: 'club-retention-update' }),
    async (req, res) => {
      res.json(await service.set(authOf(req).clubId, (req.body as { seasons: number }).seasons));
    },
  );
  return router;
}
