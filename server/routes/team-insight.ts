import { Router } from 'express';
import { validate } from '../middleware/validate';
import { TeamInsightService } from '../services/team-insight-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** GET /teams/:id/insight: attendance over time and estimated touches per player. */
export function teamInsightRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const insight = (req: Parameters<typeof scopeOf>[0]) => new TeamInsightService(scopeOf(req, dataSource));
  router.get('/teams/:id/insight', requireAuth, validate({ params: 'id-param' }), async (req, res) => {
    res.json(await insight(req).insight(req.params['id'] as string));
  });
  return router;
}
