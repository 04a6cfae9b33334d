import { Router } from 'express';
import { authRateLimit } from '../middleware/rate-limit';
import { idempotency } from '../middleware/idempotency';
import { refuseCommonPassword } from '../middleware/new-password';
import { requireConfirmedEmail } from '../middleware/require-confirmed-email';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { InvitationAcceptService, MemberService } from '../services/member-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /invitations: the lead invites by e-mail; the invitee looks the link up and accepts it. */
export function invitationsRouter({ dataSource, config, mail, requireAuth }: ApiDeps): Router {
  const router = Router();
  const members = (req: Parameters<typeof scopeOf>[0]) =>
    new MemberService(scopeOf(req, dataSource), config, mail);
  const accepting = new InvitationAcceptService(dataSource, config);
  const limiter = authRateLimit(config, dataSource, 'invitation');
  const once = idempotency(dataSource);

  // The token goes in the body, never in an address a request log would keep.
  router.post('/invitations/lookup', limiter, validate({ body: 'invitation-lookup' }), async (req, res) => {
    res.json(await accepting.lookup((req.body as { token: string }).token));
  });
  router.post(
    '/invitations/accept',
    limiter,
    validate({ body: 'invitation-accept' }),
    refuseCommonPassword('password'),
    async (req, res) => {
      res.status(201).json(await accepting.accept(req.body));
    },
  );
  router.get('/invitations', requireAuth, requireRole('lead'), async (req, res) => {
    res.json(await members(req).invitations());
  });
  router.post(
    '/invitations',
    requireAuth,
    requireRole('lead'),
    requireConfirmedEmail,
    validate({ body: 'invitation-create' }),
    once,
    async (req, res) => {
      res.status(201).json(await members(req).invite(req.body));
    },
  );
  router.delete(
    '/invitations/:id',
    requireAuth,
    requireRole('lead'),
    validate({ params: 'id-param' }),
    async (req, res) => {
      await members(req).revoke(req.params['id'] as string);
      res.status(204).end();
    },
  );
  return router;
}
