import type { Router } from 'express';
import { ClubUnitsService } from '../services/unit-settings';
import type { ApiDeps } from './api-deps';
import { clubSettingRouter } from './club-setting';

/**
 * /club/units: what the caller's club reads distances and temperatures in. Everyone in the club
 * reads it; the head of coaching changes it. Plans stay metric whatever it says.
 */
export function clubUnitsRouter({ dataSource, requireAuth }: ApiDeps): Router {
  return clubSettingRouter('units', 'club-units-update', new ClubUnitsService(dataSource), requireAuth);
}
