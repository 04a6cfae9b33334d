import '../../shared/i18n/localize';
import { Router, type Request } from 'express';
import { ifMatchNumber } from '../http/detailed-problem';
import { badRequest } from '../http/problem';
import { idempotency } from '../middleware/idempotency';
import { requireConfirmedEmail } from '../middleware/require-confirmed-email';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import type { Paper } from '../pdf';
import { PlanCardService } from '../services/plan-card-service';
import { PlanService, type ListPlansQuery } from '../services/plan-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** The If-Match version, or 400 when the header is not a number. */
export function ifMatchOf(req: Request): number | null {
  const value = ifMatchNumber(req.get('if-match'));
  if (value === 'invalid')
    throw badRequest($localize`If-Match must be a version number.`, [
      { field: 'If-Match', message: $localize`:field error after the header's name:must be a number` },
    ]);
  return value;
}

/** /plans: generate, list, read, edit, print and share session plans. */
export function plansRouter({ dataSource, config, requireAuth, mail }: ApiDeps): Router {
  const router = Router();
  const plans = (req: Request) => new PlanService(scopeOf(req, dataSource));
  const cards = (req: Request) => new PlanCardService(scopeOf(req, dataSource), mail, config);
  const id = validate({ params: 'id-param' });
  const planners = requireRole('lead', 'coach');
  const once = idempotency(dataSource);

  router.post('/plans', requireAuth, planners, validate({ body: 'plan-create' }), once, async (req, res) => {
    const created = await plans(req).create(req.body);
    // The version as ETag, as GET /plans/:id answers, and no hash of the 22 kB body.
    res
      .status(201)
      .location(`/api/plans/${created.id}`)
      .setHeader('ETag', `"${created.version}"`)
      .type('json')
      .send(created.json);
  });
  router.get('/plans', requireAuth, validate({ query: 'plan-list-query' }), async (req, res) => {
    res.json(await plans(req).list(req.query as unknown as ListPlansQuery));
  });
  router.get('/plans/:id', requireAuth, id, async (req, res) => {
    const dto = await plans(req).get(req.params['id'] as string);
    res.setHeader('ETag', `"${dto.version}"`).json(dto);
  });
  router.patch(
    '/plans/:id',
    requireAuth,
    planners,
    id,
    validate({ body: 'plan-update' }),
    async (req, res) => {
      const dto = await plans(req).update(req.params['id'] as string, req.body, ifMatchOf(req));
      res.setHeader('ETag', `"${dto.version}"`).json(dto);
    },
  );
  router.delete('/plans/:id', requireAuth, planners, id, async (req, res) => {
    await plans(req).remove(req.params['id'] as string);
    res.status(204).end();
  });
  router.get('/plans/:id/pdf', requireAuth, id, validate({ query: 'plan-pdf-query' }), async (req, res) => {
    const paper = (req.query as { paper: Paper }).paper;
    const { pdf, filename } = await cards(req).pdf(req.params['id'] as string, paper);
    res.type('application/pdf').setHeader('Content-Disposition', `inline; filename="${filename}"`).send(pdf);
  });
  router.post(
    '/plans/:id/share',
    requireAuth,
    planners,
    requireConfirmedEmail,
    id,
    validate({ body: 'plan-share' }),
    once,
    async (req, res) => {
      res.status(202).json(await cards(req).share(req.params['id'] as string, req.body));
    },
  );
  return router;
}
