import { Router } from 'express';
import { validate } from '../middleware/validate';
import { PinnedActivityService } from '../services/pinned-activity-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /teams/:id/pinned-activities: what the team's staff want in its next plan. */
export function pinnedActivitiesRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  router.put(
    '/teams/:id/pinned-activities',
    requireAuth,
    validate({ params: 'id-param' }),
    validate({ body: 'team-pinned-activities' }),
    async (req, res) => {
      const service = new PinnedActivityService(scopeOf(req, dataSource));
      res.json(await service.put(req.params['id'] as string, req.body.activityIds));
    },
  );
  return router;
}
