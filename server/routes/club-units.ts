import type { Router } from 'express';
import { ClubUnitsService } from '../services/club-units-service';
import type { ApiDeps } from './api-deps';
import { clubSettingRouter } from './club-setting';

/**
 * /club/units: what the caller's club reads distances and temperatures in. Everyone in the club
 * reads it; the head of coaching changes it. Plans stay metric whatever it says.
 */
export function clubUnitsRouter(deps: ApiDeps): Router {
  return clubSettingRouter('units', 'club-units-update', (scope) => new ClubUnitsService(scope), deps);
}
