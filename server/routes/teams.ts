import { Router } from 'express';
import { idempotency } from '../middleware/idempotency';
import { validate } from '../middleware/validate';
import { TeamService } from '../services/team-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /teams: squads of the caller's club. */
export function teamsRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const service = (req: Parameters<typeof scopeOf>[0]) => new TeamService(scopeOf(req, dataSource));
  const id = validate({ params: 'id-param' });
  const once = idempotency(dataSource);

  router.get('/teams', requireAuth, async (req, res) => {
    res.json(await service(req).list());
  });
  router.post('/teams', requireAuth, validate({ body: 'team-create' }), once, async (req, res) => {
    res.status(201).json(await service(req).create(req.body));
  });
  router.get('/teams/:id', requireAuth, id, async (req, res) => {
    res.json(await service(req).get(req.params['id'] as string));
  });
  router.patch('/teams/:id', requireAuth, id, validate({ body: 'team-update' }), async (req, res) => {
    res.json(await service(req).update(req.params['id'] as string, req.body));
  });
  // Staff: one member on or off the team at a time; the answer is the team with its staff.
  const staff = validate({ params: 'team-staff-param' });
  router.put('/teams/:id/staff/:userId', requireAuth, staff, async (req, res) => {
    res.json(await service(req).addStaff(req.params['id'] as string, req.params['userId'] as string));
  });
  router.delete('/teams/:id/staff/:userId', requireAuth, staff, async (req, res) => {
    res.json(await service(req).removeStaff(req.params['id'] as string, req.params['userId'] as string));
  });
  router.delete('/teams/:id', requireAuth, id, async (req, res) => {
    await service(req).remove(req.params['id'] as string);
    res.status(204).end();
  });
  return router;
}
