import { Router } from 'express';
import { validate } from '../middleware/validate';
import { AttendanceService } from '../services/attendance-service';
import type { ApiDeps } from './api-deps';
import { planIdOf } from './plan-id';
import { scopeOf } from './scoped';

/** /plans/:id/attendance: who came to a planned session (the register). */
export function attendanceRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const attendance = (req: Parameters<typeof scopeOf>[0]) => new AttendanceService(scopeOf(req, dataSource));
  const id = validate({ params: 'id-param' });

  router.get('/plans/:id/attendance', requireAuth, id, async (req, res) => {
    res.json(await attendance(req).get(planIdOf(req)));
  });
  router.put(
    '/plans/:id/attendance',
    requireAuth,
    id,
    validate({ body: 'attendance-update' }),
    async (req, res) => {
      res.json(await attendance(req).put(planIdOf(req), req.body));
    },
  );
  return router;
}
