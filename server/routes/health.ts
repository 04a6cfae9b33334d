import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { HealthDto } from '../../shared/types/api';
import type { ApiDeps } from './api-deps';

/**
 * How long the health check waits for the database: a load balancer asking every few seconds
 * must hear "down" promptly, not after the pool's own connection timeout.
 */
export const HEALTH_DB_TIMEOUT_MS = 1_500;

/** Whether `SELECT 1` comes back within HEALTH_DB_TIMEOUT_MS. */
async function databaseAnswers(dataSource: DataSource): Promise<boolean> {
  if (!dataSource.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), HEALTH_DB_TIMEOUT_MS);
  });
  const answered = dataSource.query('SELECT 1').then(
    () => true,
    () => false,
  );
  try {
    return await Promise.race([answered, late]);
  } finally {
    clearTimeout(timer);
  }
}

/** GET /api/health: 200 with the database up, 503 when it is down or does not answer in time. */
export function healthRouter({ dataSource, config }: ApiDeps): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const db: HealthDto['db'] = (await databaseAnswers(dataSource)) ? 'up' : 'down';
    const body: HealthDto = { status: db === 'up' ? 'ok' : 'degraded', db, version: config.version };
    res.status(db === 'up' ? 200 : 503).json(body);
  });
  return router;
}
