import '../../shared/i18n/localize';
import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { HttpError } from '../http/problem';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { RuleSetService } from '../services/rule-set-service';
import type { ApiDeps } from './api-deps';
import { ifMatchOf } from './plans';

/** /rule-sets: the club's rules. Every member reads; the lead drafts, publishes and rolls back. */
export function ruleSetsRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const ruleSets = new RuleSetService(dataSource);
  const lead = requireRole('lead');
  const id = validate({ params: 'rule-set-param' });
  const draftId = validate({ params: 'id-param' });

  router.get('/rule-sets', requireAuth, async (req, res) => {
    res.json(await ruleSets.list(authOf(req)));
  });
  router.get(
    '/rule-sets/history',
    requireAuth,
    validate({ query: 'rule-set-history-query' }),
    async (req, res) => {
      res.json(await ruleSets.history(authOf(req), (req.query as { ruleSetId?: string }).ruleSetId));
    },
  );
  router.get('/rule-sets/reach', requireAuth, lead, async (req, res) => {
    res.json(await ruleSets.reach(authOf(req)));
  });
  router.post('/rule-sets', requireAuth, lead, validate({ body: 'rule-set-create' }), async (req, res) => {
    const dto = await ruleSets.createDraft(authOf(req), req.body);
    res.status(201).location(`/api/rule-sets/${dto.id}`).setHeader('ETag', `"${dto.revision}"`).json(dto);
  });
  router.post(
    '/rule-sets/rollback',
    requireAuth,
    lead,
    validate({ body: 'rule-set-rollback' }),
    async (req, res) => {
      res.status(201).json(await ruleSets.rollback(authOf(req), req.body.to));
    },
  );
  router.get('/rule-sets/:id', requireAuth, id, async (req, res) => {
    const dto = await ruleSets.get(authOf(req), req.params['id'] as string);
    res.setHeader('ETag', `"${dto.revision}"`).json(dto);
  });
  router.get('/rule-sets/:id/summary', requireAuth, id, async (req, res) => {
    res.json(await ruleSets.summary(authOf(req), req.params['id'] as string));
  });
  router.put(
    '/rule-sets/:id',
    requireAuth,
    lead,
    draftId,
    validate({ body: 'rule-set-update' }),
    async (req, res) => {
      const revision = ifMatchOf(req);
      if (revision === null) {
        throw new HttpError(
          428,
          $localize`:title of an error answer:Precondition required`,
          $localize`Send If-Match with the revision you edited.`,
          undefined,
          '/problems/precondition-required',
        );
      }
      const dto = await ruleSets.update(authOf(req), req.params['id'] as string, req.body, revision);
      res.setHeader('ETag', `"${dto.revision}"`).json(dto);
    },
  );
  router.post('/rule-sets/:id/publish', requireAuth, lead, draftId, async (req, res) => {
    res.json(await ruleSets.publish(authOf(req), req.params['id'] as string, ifMatchOf(req)));
  });
  return router;
}
