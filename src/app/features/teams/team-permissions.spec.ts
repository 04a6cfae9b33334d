import type { Role } from '../../../../shared/types';
import { staffChangeAllowed, teamPermissions } from './team-permissions';

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
    expect(teamPermissions(user, TEAM)).toEqual({ change: allowed, delete: allowed, staff: allowed });
  });

  it('allows nothing while the member or the team is unknown', () => {
    const none = { change: false, delete: false, staff: false };
    expect(teamPermissions(null, TEAM)).toEqual(none);
    expect(teamPermissions(member('lead', 'lead-1'), null)).toEqual(none);
    expect(staffChangeAllowed(null, TEAM, { userId: 'helper-2', role: 'assistant' }, 'add')).toBe(false);
  });
});

describe('staffChangeAllowed', () => {
  const helper = { userId: 'helper-2', role: 'assistant' as const };
  const coach = { userId: 'coach-2', role: 'coach' as const };
  it.each([
    ['the lead adds a coach', true, member('lead', 'lead-1'), coach, 'add'],
    [
      'the lead takes a coach off',
      true,
      member('lead', 'lead-1'),
      { userId: 'coach-1', role: 'coach' },
      'remove',
    ],
    ['a coach on the team adds an assistant', true, member('coach', 'coach-1'), helper, 'add'],
    [
      'a coach on the team takes an assistant off',
      true,
      member('coach', 'coach-1'),
      { userId: 'helper-1', role: 'assistant' },
      'remove',
    ],
    ['a coach on the team adds another coach', false, member('coach', 'coach-1'), coach, 'add'],
    [
      'a coach on the team takes themselves off',
      false,
      member('coach', 'coach-1'),
      { userId: 'coach-1', role: 'coach' },
      'remove',
    ],
    ['a coach of another team adds an assistant', false, member('coach', 'coach-2'), helper, 'add'],
    ['an assistant on the team adds an assistant', false, member('assistant', 'helper-1'), helper, 'add'],
  ] as const)('%s: %s', (_what, allowed, user, target, change) => {
    expect(staffChangeAllowed(user, TEAM, target, change)).toBe(allowed);
  });
});
