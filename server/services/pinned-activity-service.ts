import '../../shared/i18n/localize';
import type { PinnedActivitiesDto } from '../../shared/types/api';
import { Team } from '../entities/team';
import { badRequest, type FieldError } from '../http/problem';
import type { ClubScope } from './club-scope';
import { publishedRules } from './rules-resolver';

/** Activities a team's staff pin for its next plan; the next plan takes them and clears them. */
export class PinnedActivityService {
  constructor(private readonly scope: ClubScope) {}

  /**
   * Replaces the team's pins (lead and the team's coaches, as for any change to the team). Every
   * id must be an activity of the club's published rules (the default rules when none) that is
   * not retired; repeats are kept once.
   */
  async put(teamId: string, activityIds: string[]): Promise<PinnedActivitiesDto> {
    const team = await this.scope.teamToManage(teamId);
    const rules = await publishedRules(this.scope.manager, this.scope.clubId);
    const library = new Map(rules.parameters.activities.map((a) => [a.id, a]));
    const errors: FieldError[] = [];
    activityIds.forEach((id, i) => {
      const activity = library.get(id);
      if (!activity)
        errors.push({
          field: `activityIds/${i}`,
          message: $localize`“${id}:activityId:” is not an activity in the club’s rules`,
        });
      else if (activity.retired)
        errors.push({
          field: `activityIds/${i}`,
          message: $localize`${activity.title}:activity: is retired and no longer planned`,
        });
    });
    if (errors.length)
      throw badRequest($localize`Some pinned activities are not in the club’s rules.`, errors);
    const pins = [...new Set(activityIds)];
    await this.scope.manager
      .getRepository(Team)
      .update({ id: team.id, clubId: this.scope.clubId }, { pinnedActivityIds: pins });
    return { activityIds: pins };
  }
}
