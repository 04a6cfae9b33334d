import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { validate } from '../middleware/validate';
import { AttendanceService } from '../services/attendance-service';
import { FeedbackService } from '../services/feedback-service';
import { PitchSideService } from '../services/pitch-side-service';
import type { ApiDeps } from './api-deps';

/** What happens around a plan: attendance, station feedback, pitch-side re-plans and progressions. */
export function planActivityRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const attendance = new AttendanceService(dataSource);
  const feedback = new FeedbackService(dataSource);
  const pitchSide = new PitchSideService(dataSource);
  const id = validate({ params: 'id-param' });
  const planId = (req: { params: Record<string, unknown> }) => req.params['id'] as string;

  router.get('/plans/:id/attendance', requireAuth, id, async (req, res) => {
    res.json(await attendance.get(authOf(req), planId(req)));
  });
  router.put(
    '/plans/:id/attendance',
    requireAuth,
    id,
    validate({ body: 'attendance-update' }),
    async (req, res) => {
      res.json(await attendance.put(authOf(req), planId(req), req.body));
    },
  );
  router.get('/plans/:id/feedback', requireAuth, id, async (req, res) => {
    res.json(await feedback.list(authOf(req), planId(req)));
  });
  router.post(
    '/plans/:id/feedback',
    requireAuth,
    id,
    validate({ body: 'feedback-create' }),
    async (req, res) => {
      const { dto, created } = await feedback.record(authOf(req), planId(req), req.body);
      res.status(created ? 201 : 200).json(dto);
    },
  );
  router.post('/plans/:id/replan', requireAuth, id, validate({ body: 'plan-replan' }), async (req, res) => {
    res.json(await pitchSide.replan(authOf(req), planId(req), req.body));
  });
  router.post(
    '/plans/:id/progression',
    requireAuth,
    id,
    validate({ body: 'plan-progression' }),
    async (req, res) => {
      res.json(await pitchSide.progression(authOf(req), planId(req), req.body));
    },
  );
  return router;
}
