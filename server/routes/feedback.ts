import { Router } from 'express';
import { validate } from '../middleware/validate';
import { FeedbackService } from '../services/feedback-service';
import type { ApiDeps } from './api-deps';
import { planIdOf } from './plan-id';
import { scopeOf } from './scoped';

/** /plans/:id/feedback: how each station of a session went, as the staff judged it. */
export function feedbackRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const feedback = (req: Parameters<typeof scopeOf>[0]) => new FeedbackService(scopeOf(req, dataSource));
  const id = validate({ params: 'id-param' });

  router.get('/plans/:id/feedback', requireAuth, id, async (req, res) => {
    res.json(await feedback(req).list(planIdOf(req)));
  });
  router.post(
    '/plans/:id/feedback',
    requireAuth,
    id,
    validate({ body: 'feedback-create' }),
    async (req, res) => {
      const { dto, created } = await feedback(req).record(planIdOf(req), req.body);
      res.status(created ? 201 : 200).json(dto);
    },
  );
  return router;
}
