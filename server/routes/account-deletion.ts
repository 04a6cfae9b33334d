import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { validate } from '../middleware/validate';
import { AccountDeletionService } from '../services/account-erasure';
import type { ApiDeps } from './api-deps';

/** DELETE /auth/me: the caller deletes their own account, giving their password (204). */
export function accountDeletionRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const service = new AccountDeletionService(dataSource);
  router.delete('/auth/me', requireAuth, validate({ body: 'account-delete' }), async (req, res) => {
    await service.deleteOwn(authOf(req), req.body.password);
    res.status(204).end();
  });
  return router;
}
