import type { TeamDto, UserDto } from '../../../../shared/types';

/**
 * Who may change a team's schedule and calendar link, as the server decides it
 * (ScheduleService.teamToSchedule): the lead, or anyone on the team's staff (its coaches and
 * assistants, all in `coachIds`). Change the two together.
 */
export function canEditSchedule(
  user: Pick<UserDto, 'id' | 'role'> | null,
  team: Pick<TeamDto, 'coachIds'> | null,
): boolean {
  if (!user || !team) return false;
  return user.role === 'lead' || team.coachIds.includes(user.id);
}
