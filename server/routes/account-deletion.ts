import { Router } from 'express';
import { validate } from '../middleware/validate';
import { AccountDeletionService } from '../services/account-erasure';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** DELETE /auth/me: the caller deletes their own account, giving their password (204). */
export function accountDeletionRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  router.delete('/auth/me', requireAuth, validate({ body: 'account-delete' }), async (req, res) => {
    await new AccountDeletionService(scopeOf(req, dataSource)).deleteOwn(req.body.password);
    res.status(204).end();
  });
  return router;
}
