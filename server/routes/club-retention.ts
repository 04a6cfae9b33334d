import type { Router } from 'express';
import { RetentionService } from '../services/retention-service';
import type { ApiDeps } from './api-deps';
import { clubSettingRouter } from './club-setting';

/**
 * /club/retention: how many seasons the caller's club keeps plans, attendance and feedback.
 * Everyone in the club reads it; the head of coaching changes it.
 */
export function clubRetentionRouter({ dataSource, requireAuth }: ApiDeps): Router {
  return clubSettingRouter(
    'retention',
    'club-retention-update',
    new RetentionService(dataSource),
    requireAuth,
  );
}
