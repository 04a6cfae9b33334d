import '../../shared/i18n/localize';
import { Router } from 'express';
import { HttpError } from '../http/problem';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { RuleSetService } from '../services/rule-set-service';
import type { ApiDeps } from './api-deps';
import { ifMatchOf } from './plans';
import { scopeOf } from './scoped';

/** /rule-sets: the club's rules. Every member reads; the lead drafts, publishes and rolls back. */
export function ruleSetsRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const ruleSets = (req: Parameters<typeof scopeOf>[0]) => new RuleSetService(scopeOf(req, dataSource));
  const lead = requireRole('lead');
  const id = validate({ params: 'rule-set-param' });
  const draftId = validate({ params: 'id-param' });

  router.get('/rule-sets', requireAuth, async (req, res) => {
    res.json(await ruleSets(req).list());
  });
  router.get(
    '/rule-sets/history',
    requireAuth,
    validate({ query: 'rule-set-history-query' }),
    async (req, res) => {
      res.json(await ruleSets(req).history((req.query as { ruleSetId?: string }).ruleSetId));
    },
  );
  router.get('/rule-sets/reach', requireAuth, lead, async (req, res) => {
    res.json(await ruleSets(req).reach());
  });
  router.post('/rule-sets', requireAuth, lead, validate({ body: 'rule-set-create' }), async (req, res) => {
    const dto = await ruleSets(req).createDraft(req.body);
    res.status(201).location(`/api/rule-sets/${dto.id}`).setHeader('ETag', `"${dto.revision}"`).json(dto);
  });
  router.post(
    '/rule-sets/rollback',
    requireAuth,
    lead,
    validate({ body: 'rule-set-rollback' }),
    async (req, res) => {
      res.status(201).json(await ruleSets(req).rollback(req.body.to));
    },
  );
  router.get('/rule-sets/:id', requireAuth, id, async (req, res) => {
    const dto = await ruleSets(req).get(req.params['id'] as string);
    res.setHeader('ETag', `"${dto.revision}"`).json(dto);
  });
  router.get('/rule-sets/:id/summary', requireAuth, id, async (req, res) => {
    res.json(await ruleSets(req).summary(req.params['id'] as string));
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
      const dto = await ruleSets(req).update(req.params['id'] as string, req.body, revision);
      res.setHeader('ETag', `"${dto.revision}"`).json(dto);
    },
  );
  router.post('/rule-sets/:id/publish', requireAuth, lead, draftId, async (req, res) => {
    res.json(await ruleSets(req).publish(req.params['id'] as string, ifMatchOf(req)));
  });
  return router;
}
