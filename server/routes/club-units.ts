import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { ClubUnitsService } from '../services/unit-settings';
import type { ApiDeps } from './api-deps';

/**
 * /club/units: what the caller's club reads distances and temperatures in. Everyone in the club
 * reads it; the head of coaching changes it. Plans stay metric whatever it says.
 */
export function clubUnitsRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const service = new ClubUnitsService(dataSource);

  router.get('/club/units', requireAuth, async (req, res) => {
    res.json(await service.get(authOf(req).clubId));
  });
  router.put(
    '/club/units',
    requireAuth,
    requireRole('lead'),
    validate({ body: 'club-units-update' }),
    async (req, res) => {
      res.json(await service.set(authOf(req).clubId, req.body));
    },
  );
  return router;
}
