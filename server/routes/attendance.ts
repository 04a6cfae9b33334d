import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { validate } from '../middleware/validate';
import { AttendanceService } from '../services/attendance-service';
import type { ApiDeps } from './api-deps';
import { planIdOf } from './plan-id';

/** /plans/:id/attendance: who came to a planned session (the register). */
export function attendanceRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const attendance = new AttendanceService(dataSource);
  const id = validate({ params: 'id-param' });

  router.get('/plans/:id/attendance', requireAuth, id, async (req, res) => {
    res.json(await attendance.get(authOf(req), planIdOf(req)));
  });
  router.put(
    '/plans/:id/attendance',
    requireAuth,
    id,
    validate({ body: 'attendance-update' }),
    async (req, res) => {
      res.json(await attendance.put(authOf(req), planIdOf(req), req.body));
    },
  );
  return router;
}
