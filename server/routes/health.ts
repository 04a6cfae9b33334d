import { Router } from 'express';
import type { HealthDto } from '../../shared/types/api';
import type { ApiDeps } from './api-deps';

/** GET /api/health: 200 with the database up, 503 when it is down. */
export function healthRouter({ dataSource, config }: ApiDeps): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    let db: HealthDto['db'] = 'down';
    try {
      if (dataSource.isInitialized) {
        await dataSource.query('SELECT 1');
        db = 'up';
      }
    } catch {
      db = 'down';
    }
    const body: HealthDto = { status: db === 'up' ? 'ok' : 'degraded', db, version: config.version };
    res.status(db === 'up' ? 200 : 503).json(body);
  });
  return router;
}
