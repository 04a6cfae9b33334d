import { Router } from 'express';
import { requireRole } from '../middleware/require-role';
import { validate } from '../middleware/validate';
import { ClubDeletionService } from '../services/club-deletion-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** DELETE /club: the head of coaching deletes the whole club, typing its name (204). */
export function clubDeletionRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  router.delete(
    '/club',
    requireAuth,
    requireRole('lead'),
    validate({ body: 'club-delete' }),
    async (req, res) => {
      await new ClubDeletionService(scopeOf(req, dataSource)).deleteClub(req.body.clubName);
      res.status(204).end();
    },
  );
  return router;
}
