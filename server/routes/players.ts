import { Router } from 'express';
import multer from 'multer';
import { idempotency } from '../middleware/idempotency';
import { validate } from '../middleware/validate';
import { PlayerService } from '../services/player-service';
import { RosterImportService } from '../services/roster-import-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';
import { speakTheirLanguage } from '../middleware/request-language';

/** CSV uploads above this answer 413. */
export const CSV_UPLOAD_LIMIT_BYTES = 1024 * 1024;

/** /teams/:id/players, /players/:id and the CSV roster import. */
export function playersRouter({ dataSource, config, requireAuth }: ApiDeps): Router {
  const router = Router();
  const id = validate({ params: 'id-param' });
  const once = idempotency(dataSource);
  const players = (req: Parameters<typeof scopeOf>[0]) => new PlayerService(scopeOf(req, dataSource));
  const imports = (req: Parameters<typeof scopeOf>[0]) =>
    new RosterImportService(scopeOf(req, dataSource), config.jwtSecret);
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: CSV_UPLOAD_LIMIT_BYTES, files: 1, fields: 10 },
  });

  router.get(
    '/teams/:id/players',
    requireAuth,
    id,
    validate({ query: 'player-list-query' }),
    async (req, res) => {
      const includeInactive = (req.query as { includeInactive?: boolean }).includeInactive === true;
      res.json(await players(req).list(req.params['id'] as string, includeInactive));
    },
  );
  router.post(
    '/teams/:id/players',
    requireAuth,
    id,
    validate({ body: 'player-create' }),
    once,
    async (req, res) => {
      res.status(201).json(await players(req).create(req.params['id'] as string, req.body));
    },
  );
  // Today's guests, all or none (the plan wizard, before it asks for the plan).
  router.post(
    '/teams/:id/guests',
    requireAuth,
    id,
    validate({ body: 'guests-create' }),
    once,
    async (req, res) => {
      res.status(201).json(await players(req).addGuests(req.params['id'] as string, req.body.guests));
    },
  );
  router.post(
    '/teams/:id/players/import',
    requireAuth,
    id,
    upload.single('file'),
    speakTheirLanguage,
    async (req, res) => {
      res.json(await imports(req).preview(req.params['id'] as string, req.file?.buffer));
    },
  );
  router.post(
    '/teams/:id/players/import/commit',
    requireAuth,
    id,
    validate({ body: 'player-import-commit' }),
    once,
    async (req, res) => {
      res.status(201).json(await imports(req).commit(req.params['id'] as string, req.body));
    },
  );
  router.patch('/players/:id', requireAuth, id, validate({ body: 'player-update' }), async (req, res) => {
    res.json(await players(req).update(req.params['id'] as string, req.body));
  });
  // Erases the child: row, attendance, and their name in the club's plans, notes and unsent mail.
  router.delete('/players/:id', requireAuth, id, async (req, res) => {
    await players(req).remove(req.params['id'] as string);
    res.status(204).end();
  });
  return router;
}
