/** The register read off a re-planned plan: late arrivals and early leavers came, with their minutes. */
import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types';
import { attendanceFromPlan, generatePlan, leftEarlyIds, replan } from '../index';

const request = (ids: string[]): PlanRequest => ({
  ageGroup: 'U10',
  level: 'intermediate',
  players: ids.map((id) => ({ id, name: id })),
  coaches: 2,
  equipment: { balls: 14, cones: 40, bibs: 12, goals: 4 },
  space: { width: 40, length: 30 },
  minutes: 30,
  kind: 'match-warm-up',
  seed: 'register',
});

describe('replan and the register', () => {
  it('counts a late arrival and an early leaver as came, with their minutes (worked example)', async () => {
    const squad = ['ana', 'ben', 'cai', 'dev', 'eli', 'fay', 'gus', 'hal', 'ivy', 'jon'];
    const plan = await generatePlan(request(squad));
    const late = await replan(plan, { add: [{ id: 'kit', name: 'kit' }], fromMinute: 6 });
    const both = await replan(late.plan, { remove: ['ben'], fromMinute: 20 });

    const register = attendanceFromPlan(both.plan);
    expect(register.map((e) => e.playerId).sort()).toEqual([...squad, 'kit'].sort());
    expect(register.find((e) => e.playerId === 'kit')).toEqual({ playerId: 'kit', lateMinutes: 6 });
    expect(register.find((e) => e.playerId === 'ben')).toEqual({ playerId: 'ben', leftEarlyMinutes: 10 });
    expect(register.find((e) => e.playerId === 'ana')).toEqual({ playerId: 'ana' });
    expect([...leftEarlyIds(both.plan)]).toEqual(['ben']);
  });
});
