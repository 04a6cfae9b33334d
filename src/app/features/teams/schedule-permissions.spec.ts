import { canEditSchedule } from './schedule-permissions';

describe('canEditSchedule', () => {
  const team = { coachIds: ['coach-1', 'helper-1'] };

  it('lets the lead and the team’s own coaches and assistants keep its schedule', () => {
    expect(canEditSchedule({ id: 'lead-1', role: 'lead' }, team)).toBe(true);
    expect(canEditSchedule({ id: 'coach-1', role: 'coach' }, team)).toBe(true);
    expect(canEditSchedule({ id: 'helper-1', role: 'assistant' }, team)).toBe(true);
  });

  it('leaves it read-only for staff of other teams and before the member and team are known', () => {
    expect(canEditSchedule({ id: 'coach-2', role: 'coach' }, team)).toBe(false);
    expect(canEditSchedule({ id: 'helper-2', role: 'assistant' }, team)).toBe(false);
    expect(canEditSchedule(null, team)).toBe(false);
    expect(canEditSchedule({ id: 'lead-1', role: 'lead' }, null)).toBe(false);
  });
});
