import type { Role } from '../../../../shared/types';
import { teamPermissions } from './team-permissions';

// The team's staff list holds coaches and assistants alike.
const TEAM = { coachIds: ['coach-1', 'helper-1'] };
const member = (role: Role, id: string) => ({ role, id });

describe('teamPermissions', () => {
  it.each([
    ['the lead, not on the team', true, member('lead', 'lead-1')],
    ['the lead, also on the team', true, member('lead', 'coach-1')],
    ['a coach on the team', true, member('coach', 'coach-1')],
    ['a coach of another team', false, member('coach', 'coach-2')],
    ['an assistant on the team', false, member('assistant', 'helper-1')],
    ['an assistant not on the team', false, member('assistant', 'helper-2')],
  ])('%s may change and delete it: %s', (_who, allowed, user) => {
    expect(teamPermissions(user, TEAM)).toEqual({ change: allowed, delete: allowed });
  });

  it('allows nothing while the member or the team is unknown', () => {
    expect(teamPermissions(null, TEAM)).toEqual({ change: false, delete: false });
    expect(teamPermissions(member('lead', 'lead-1'), null)).toEqual({ change: false, delete: false });
  });
});
