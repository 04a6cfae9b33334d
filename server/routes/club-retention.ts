import type { Router } from 'express';
import { ClubRetentionService } from '../services/club-retention-service';
import type { ApiDeps } from './api-deps';
import { clubSettingRouter } from './club-setting';

/**
 * /club/retention: how many seasons the caller's club keeps plans, attendance and feedback.
 * Everyone in the club reads it; the head of coaching changes it.
 */
export function clubRetentionRouter(deps: ApiDeps): Router {
  return clubSettingRouter(
    'retention',
    'club-retention-update',
    (scope) => new ClubRetentionService(scope),
    deps,
  );
}
