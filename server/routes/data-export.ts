import { type Response, Router } from 'express';
import { validate } from '../middleware/validate';
import { DataExportService } from '../services/data-export-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/** /club/export (everything the club holds) and /teams/:id/export (one team's part), as a ZIP. */
export function dataExportRouter({ dataSource, requireAuth }: ApiDeps): Router {
  const router = Router();
  const exports = (req: Parameters<typeof scopeOf>[0]) => new DataExportService(scopeOf(req, dataSource));

  router.get('/club/export', requireAuth, async (req, res) => {
    sendZip(res, await exports(req).club());
  });
  router.get('/teams/:id/export', requireAuth, validate({ params: 'id-param' }), async (req, res) => {
    sendZip(res, await exports(req).team(req.params['id'] as string));
  });
  return router;
}

function sendZip(res: Response, { zip, filename }: { zip: Buffer; filename: string }): void {
  res
    .type('application/zip')
    .setHeader('Content-Disposition', `attachment; filename="${filename}"`)
    .setHeader('Cache-Control', 'no-store')
    .send(zip);
}
