import type { Role } from '../../../../shared/types';

/** What each role may do, in the words the invite form and the role dialog show. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  lead: $localize`:What the head of coaching may do:Club rules, members and every team`,
  coach: $localize`:What a coach may do:Runs their teams: players, kit bag and plans`,
  assistant: $localize`:What an assistant may do:Helps at sessions: sees their teams’ plans, records attendance and how stations went`,
};
