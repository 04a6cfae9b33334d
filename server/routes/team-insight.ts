import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { validate } from '../middleware/validate';
import { TeamInsightService } from '../services/team-insight-service';
import type { ApiDeps } from './api-deps';

/** GET /teams/:id/insight: attendance over time and estimated touches per player. */
export function teamInsightRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const insight = new TeamInsightService(dataSource);
  router.get('/teams/:id/insight', requireAuth, validate({ params: 'id-param' }), async (req, res) => {
    res.json(await insight.insight(authOf(req), req.params['id'] as string));
  });
  return router;
}
