import type { Role } from '../../../../shared/types';

/** What each role may do, in the words the invite form and the role dialog show. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  lead: 'Club rules, members and every team',
  coach: 'Runs their teams: players, kit bag and plans',
  assistant: 'Helps at sessions: sees their teams’ plans, records attendance and how stations went',
};
