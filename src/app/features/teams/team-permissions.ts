import {
  staffChangeRefusal,
  type StaffChange,
  type StaffMember,
  type TeamDto,
  type UserDto,
} from '../../../../shared/types';

/** What the signed-in member may do to one team, as the API decides it. */
export interface TeamPermissions {
  /** Change the team: its details, kit bag and squad (add, edit, import, remove), and plan for it. */
  readonly change: boolean;
  /** Delete the team with its players, plans and kit bag. */
  readonly delete: boolean;
  /** Change who is on its staff at all (which members, `staffChangeAllowed` says). */
  readonly staff: boolean;
}

/** Shown instead of the editing controls to everyone else. */
export const READ_ONLY_NOTE = $localize`Only the head of coaching or this team’s coaches can change it.`;

const NONE: TeamPermissions = { change: false, delete: false, staff: false };

/**
 * Mirrors the server's one rule for every route that changes a team (ClubScope.teamToManage):
 * the lead may change every team, a coach the teams they are attached to, an assistant none,
 * attached or not (the team's `coachIds` list assistants too). Deleting follows the same rule, and
 * so does changing the staff; which members a coach may put on or take off is the shared
 * `staffChangeRefusal`, the one the API applies. Nothing is allowed before both the member and the
 * team are known.
 */
export function teamPermissions(
  user: Pick<UserDto, 'id' | 'role'> | null,
  team: Pick<TeamDto, 'coachIds'> | null,
): TeamPermissions {
  if (!user || !team) return NONE;
  const manage = user.role === 'lead' || (user.role === 'coach' && team.coachIds.includes(user.id));
  return { change: manage, delete: manage, staff: manage };
}

/** Whether the signed-in member may put this member on the team, or take them off it. */
export function staffChangeAllowed(
  user: Pick<UserDto, 'id' | 'role'> | null,
  team: Pick<TeamDto, 'coachIds'> | null,
  member: StaffMember,
  change: StaffChange,
): boolean {
  if (!user || !team) return false;
  return staffChangeRefusal(user, team.coachIds, member, change) === null;
}
