import '../i18n/localize';
import type { Role } from './api';

/** Putting a member on a team's staff, or taking them off. */
export type StaffChange = 'add' | 'remove';

/** The member asking for a staff change. */
export interface StaffCaller {
  id: string;
  role: Role;
}

/** The member being put on or taken off the team. */
export interface StaffMember {
  userId: string;
  role: Role;
}

/**
 * Who may change a team's staff, asked by the API before every change and by the team and members
 * pages before offering one: the lead, anyone on any team; a coach attached to the team, its
 * assistants only, and never themselves off it; nobody else. Null when allowed, else the reason in
 * the words the screen shows.
 */
export function staffChangeRefusal(
  caller: StaffCaller,
  teamStaffIds: readonly string[],
  member: StaffMember,
  change: StaffChange,
): string | null {
  if (caller.role === 'lead') return null;
  if (caller.role !== 'coach' || !teamStaffIds.includes(caller.id)) {
    return $localize`Only the head of coaching and this team’s coaches can change who helps with it.`;
  }
  if (member.userId === caller.id) {
    return change === 'remove'
      ? $localize`You cannot take yourself off your own team. Ask the head of coaching.`
      : null;
  }
  if (member.role !== 'assistant') {
    return $localize`Coaches can add and remove assistants. Ask the head of coaching to change this team’s coaches.`;
  }
  return null;
}
