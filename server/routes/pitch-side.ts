import { Router } from 'express';
import { validate } from '../middleware/validate';
import { PitchSideService } from '../services/pitch-side-service';
import type { ApiDeps } from './api-deps';
import { planIdOf } from './plan-id';
import { scopeOf } from './scoped';

/** /plans/:id/replan and /plans/:id/progression: changes to a plan pitch-side, checked by the engine. */
export function pitchSideRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const pitchSide = (req: Parameters<typeof scopeOf>[0]) => new PitchSideService(scopeOf(req, dataSource));
  const id = validate({ params: 'id-param' });

  router.post('/plans/:id/replan', requireAuth, id, validate({ body: 'plan-replan' }), async (req, res) => {
    res.json(await pitchSide(req).replan(planIdOf(req), req.body));
  });
  router.post(
    '/plans/:id/progression',
    requireAuth,
    id,
    validate({ body: 'plan-progression' }),
    async (req, res) => {
      res.json(await pitchSide(req).progression(planIdOf(req), req.body));
    },
  );
  return router;
}
