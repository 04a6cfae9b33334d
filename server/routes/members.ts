import { Router } from 'express';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { MemberService } from '../services/member-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /members: who is in the club. Everyone reads; the lead changes. */
export function membersRouter({ dataSource, config, mail, requireAuth }: ApiDeps): Router {
  const router = Router();
  const service = (req: Parameters<typeof scopeOf>[0]) =>
    new MemberService(scopeOf(req, dataSource), config, mail);
  const userId = validate({ params: 'member-param' });

  router.get('/members', requireAuth, async (req, res) => {
    res.json(await service(req).list());
  });
  router.patch(
    '/members/:userId',
    requireAuth,
    requireRole('lead'),
    userId,
    validate({ body: 'member-update' }),
    async (req, res) => {
      res.json(await service(req).changeRole(req.params['userId'] as string, req.body.role));
    },
  );
  router.delete('/members/:userId', requireAuth, requireRole('lead'), userId, async (req, res) => {
    await service(req).remove(req.params['userId'] as string);
    res.status(204).end();
  });
  return router;
}
