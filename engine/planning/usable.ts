/**
 * Whether an activity can be used for a request, and why not: first the age and the club's
 * rules, then the squad's numbers and the kit. The planner (pins), the swap menu and the edits
 * all ask here.
 */
import type {
  ActivityDefinition,
  AgeBand,
  ForbiddenActivity,
  PlanRequest,
  RuleParameters,
} from '../../shared/types';
import { activityBlocked, notEnoughForIt } from './activities';
import { activityFeasible } from './allocation';

/** What ruling an activity out needs: the parameters, the age and what the club's rules forbid. */
export interface RuleContext {
  params: RuleParameters;
  request: Pick<PlanRequest, 'ageGroup'>;
  forbidden: ForbiddenActivity[];
}

/** What deciding whether the squad can play an activity needs besides. */
export interface UseContext extends RuleContext {
  request: Pick<PlanRequest, 'ageGroup' | 'level' | 'players' | 'coaches' | 'equipment'>;
  band: AgeBand;
}

/** Why the age or the club's rules rule an activity out, or null when they allow it. */
export function ruledOut(ctx: RuleContext, activity: ActivityDefinition): string | null {
  return activityBlocked(ctx.params, ctx.request.ageGroup, ctx.forbidden, activity);
}

/** Why the squad cannot use an activity today (ruled out, too few players or not enough kit), or null. */
export function whyUnusable(ctx: UseContext, activity: ActivityDefinition): string | null {
  const { params, request, band } = ctx;
  const fits = () =>
    activityFeasible(request.players.length, request.coaches, activity, {
      params,
      level: request.level,
      band,
      kit: request.equipment,
    });
  return ruledOut(ctx, activity) ?? (fits() ? null : notEnoughForIt());
}
