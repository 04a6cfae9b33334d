import { Router } from 'express';
import { idempotency } from '../middleware/idempotency';
import { validate } from '../middleware/validate';
import { ScheduleService, type ScheduleQuery } from '../services/schedule-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/**
 * /teams/:id/schedule: a team's training nights and matches (list, add one, add weekly, change,
 * delete); /scheduled-sessions: the caller's teams' sessions, and one session to plan from.
 */
export function scheduleRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const id = validate({ params: 'id-param' });
  const session = validate({ params: 'schedule-param' });
  const query = validate({ query: 'schedule-query' });
  const service = (req: Parameters<typeof scopeOf>[0]) => new ScheduleService(scopeOf(req, dataSource));
  const once = idempotency(dataSource);

  router.get('/teams/:id/schedule', requireAuth, id, query, async (req, res) => {
    res.json(await service(req).list(req.params['id'] as string, req.query as unknown as ScheduleQuery));
  });
  router.post(
    '/teams/:id/schedule',
    requireAuth,
    id,
    validate({ body: 'scheduled-session' }),
    once,
    async (req, res) => {
      res.status(201).json(await service(req).create(req.params['id'] as string, req.body));
    },
  );
  router.post(
    '/teams/:id/schedule/weekly',
    requireAuth,
    id,
    validate({ body: 'weekly-sessions' }),
    once,
    async (req, res) => {
      res.status(201).json(await service(req).createWeekly(req.params['id'] as string, req.body));
    },
  );
  router.patch(
    '/teams/:id/schedule/:sessionId',
    requireAuth,
    session,
    validate({ body: 'scheduled-session-update' }),
    async (req, res) => {
      res.json(
        await service(req).update(req.params['id'] as string, req.params['sessionId'] as string, req.body),
      );
    },
  );
  router.delete('/teams/:id/schedule/:sessionId', requireAuth, session, async (req, res) => {
    await service(req).remove(req.params['id'] as string, req.params['sessionId'] as string);
    res.status(204).end();
  });

  router.get('/scheduled-sessions', requireAuth, query, async (req, res) => {
    res.json(await service(req).upcoming(req.query as unknown as ScheduleQuery));
  });
  router.get('/scheduled-sessions/:id', requireAuth, id, async (req, res) => {
    res.json(await service(req).get(req.params['id'] as string));
  });
  return router;
}
