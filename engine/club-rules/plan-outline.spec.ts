import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types/plan-request';
import { generatePlan } from '../generate-plan';
import { outlineChanges, outlinePlan } from './plan-outline';

/** 5 players and 2 coaches: passing and finishing in threes needs a coach to make a second three. */
const REQUEST: PlanRequest = {
  ageGroup: 'U10',
  level: 'intermediate',
  players: Array.from({ length: 5 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 2,
  equipment: { balls: 5, cones: 40, bibs: 10, goals: 2 },
  space: { width: 40, length: 30 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 's1',
};

describe('outlinePlan', () => {
  it('marks a group a coach joins with "+ coach" and leaves the other groups as bare counts', async () => {
    const plan = await generatePlan(REQUEST);
    const joined = plan.phases.flatMap((phase) => phase.stations.filter((s) => s.coachJoins));
    expect(joined.length).toBeGreaterThan(0);
    const lines = outlinePlan(plan).groups.split('\n');
    plan.phases.forEach((phase, i) => {
      const withCoach = phase.stations.filter((s) => s.coachJoins).length;
      expect(lines[i]!.split('+ coach').length - 1).toBe(withCoach);
    });
  });

  it('writes a line per phase: its areas in metres and its minutes, in order', async () => {
    const plan = await generatePlan(REQUEST);
    const outline = outlinePlan(plan);
    expect(outline.areas.split('\n')).toHaveLength(plan.phases.length);
    expect(outline.areas).toMatch(/\d+ × \d+ m/);
    expect(outline.timing.split(' → ')).toEqual(
      plan.phases.map((p) => `${p.name} ${p.endMinute - p.startMinute}′`),
    );
  });
});

describe('outlineChanges', () => {
  it('names the aspects that differ, and none between a plan and itself', async () => {
    const outline = outlinePlan(await generatePlan(REQUEST));
    expect(outlineChanges(outline, outline)).toEqual([]);
    expect(outlineChanges(outline, { ...outline, timing: 'Arrival 20′', warnings: 'Too hot' })).toEqual([
      'timing',
      'warnings',
    ]);
  });
});
