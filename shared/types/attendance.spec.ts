/** The register pitch-side kept, read off a plan's roster changes. */
import { describe, expect, it } from 'vitest';
import { attendanceFromPlan, leftEarlyIds } from './attendance';

describe('attendanceFromPlan', () => {
  it('leaves out a player taken off before the start, and one who came back is on time', () => {
    const plan = {
      request: { players: [{ id: 'ana' }, { id: 'cai' }], minutes: 30 },
      rosterChanges: [
        { fromMinute: 0, added: [], removed: ['ben'] },
        { fromMinute: 5, added: [], removed: ['cai'] },
        { fromMinute: 9, added: ['cai'], removed: [] },
      ],
    };
    expect(attendanceFromPlan(plan)).toEqual([{ playerId: 'ana' }, { playerId: 'cai' }]);
    expect(leftEarlyIds(plan).size).toBe(0);
  });
});
