import { describe, expect, it } from 'vitest';
import type { TeamDto } from '../../shared/types/api';
import { generatePlan } from '../generate-plan';
import { validatePlanRequest } from '../schema/validate-plan-request';
import { sampleSquads, teamSquad } from './sample-squads';

const team: TeamDto = {
  id: 't1',
  name: 'Harbour Herons U9',
  ageGroup: 'U9',
  level: 'beginner',
  usualSpace: { width: 30, length: 36 },
  coachIds: ['u1'],
  playerCount: 9,
  pinnedActivityIds: [],
};

describe('sampleSquads', () => {
  it('tries the five situations at the given age and level, each a valid request', () => {
    const squads = sampleSquads('U12', 'advanced');
    expect(squads.map((s) => [s.id, s.label, s.request.players.length])).toEqual([
      ['small', 'Small squad (5)', 5],
      ['odd', 'Odd numbers (13)', 13],
      ['large', 'Large squad (24)', 24],
      ['tiny-space', 'Tiny space (12 on 15 × 20 m)', 12],
      ['no-goals', 'No goals (11)', 11],
    ]);
    for (const { request } of squads) {
      expect(validatePlanRequest(request).errors).toEqual([]);
      expect(request).toMatchObject({ ageGroup: 'U12', level: 'advanced', minutes: 20, seed: 'try-it' });
    }
    // A squad of ten or more brings a goalkeeper; the labels' sizes are the requests' own.
    expect(squads[0]!.request.players.some((p) => p.goalkeeper)).toBe(false);
    expect(squads[1]!.request.players.filter((p) => p.goalkeeper)).toHaveLength(1);
    expect(squads[3]!.request.space).toEqual({ width: 15, length: 20 });
    expect(squads[4]!.request.equipment.goals).toBe(0);
  });

  it('makes the same plan twice for the same squad and rules', async () => {
    const [small] = sampleSquads('U10', 'intermediate');
    expect(await generatePlan(small!.request)).toEqual(await generatePlan(small!.request));
  });
});

describe('teamSquad', () => {
  it('is the team as it usually trains, with its kit bag', () => {
    const squad = teamSquad(team, { balls: 7, cones: 16, bibs: 8, goals: 0 })!;
    expect(squad.id).toBe('team-t1');
    expect(squad.label).toBe('Harbour Herons U9 as usual (9 players on 30 × 36 m, 7 balls, 0 goals)');
    expect(squad.request).toMatchObject({
      ageGroup: 'U9',
      level: 'beginner',
      equipment: { balls: 7, cones: 16, bibs: 8, goals: 0 },
      space: { width: 30, length: 36 },
    });
    expect(squad.request.players).toHaveLength(9);
    expect(validatePlanRequest(squad.request).errors).toEqual([]);
  });

  it('caps a large team at the most players a plan takes, and skips a team with none', () => {
    const kit = { balls: 20, cones: 40, bibs: 20, goals: 4 };
    expect(teamSquad({ ...team, playerCount: 95 }, kit)!.request.players).toHaveLength(60);
    expect(teamSquad({ ...team, playerCount: 0 }, kit)).toBeNull();
  });
});
