import { Router } from 'express';
import type { ApiDeps } from './api-deps';
import { accountDeletionRouter } from './account-deletion';
import { attendanceRouter } from './attendance';
import { authRouter } from './auth';
import { calendarRouter } from './calendar';
import { clubRetentionRouter } from './club-retention';
import { clubDeletionRouter } from './club-deletion';
import { clubUnitsRouter } from './club-units';
import { dataExportRouter } from './data-export';
import { feedbackRouter } from './feedback';
import { healthRouter } from './health';
import { helperLinksRouter } from './helper-links';
import { invitationsRouter } from './invitations';
import { kitRouter } from './kit';
import { membersRouter } from './members';
import { pinnedActivitiesRouter } from './pinned-activities';
import { pitchSideRouter } from './pitch-side';
import { plansRouter } from './plans';
import { playersRouter } from './players';
import { ruleSetsRouter } from './rule-sets';
import { scheduleRouter } from './schedule';
import { teamInsightRouter } from './team-insight';
import { teamsRouter } from './teams';

export type { ApiDeps } from './api-deps';

/** Every API router, mounted under /api. Add one line per resource. */
export function createApiRouter(deps: ApiDeps): Router {
  const api = Router();
  api.use(healthRouter(deps));
  api.use(authRouter(deps));
  api.use(invitationsRouter(deps));
  api.use(membersRouter(deps));
  api.use(teamsRouter(deps));
  api.use(playersRouter(deps));
  api.use(kitRouter(deps));
  api.use(pinnedActivitiesRouter(deps));
  api.use(plansRouter(deps));
  api.use(attendanceRouter(deps));
  api.use(feedbackRouter(deps));
  api.use(pitchSideRouter(deps));
  api.use(helperLinksRouter(deps));
  api.use(ruleSetsRouter(deps));
  api.use(teamInsightRouter(deps));
  api.use(scheduleRouter(deps));
  api.use(calendarRouter(deps));
  api.use(clubUnitsRouter(deps));
  api.use(accountDeletionRouter(deps));
  api.use(clubDeletionRouter(deps));
  api.use(dataExportRouter(deps));
  api.use(clubRetentionRouter(deps));
  return api;
}
