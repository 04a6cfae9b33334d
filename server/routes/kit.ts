import { Router } from 'express';
import { validate } from '../middleware/validate';
import { KitService } from '../services/kit-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /teams/:id/kit: the team's kit bag. */
export function kitRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const id = validate({ params: 'id-param' });
  router.get('/teams/:id/kit', requireAuth, id, async (req, res) => {
    res.json(await new KitService(scopeOf(req, dataSource)).get(req.params['id'] as string));
  });
  router.put('/teams/:id/kit', requireAuth, id, validate({ body: 'kit-bag' }), async (req, res) => {
    res.json(await new KitService(scopeOf(req, dataSource)).put(req.params['id'] as string, req.body));
  });
  return router;
}
