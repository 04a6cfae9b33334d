/** Goals face away from neighbouring stations; cones never exceed the bag. */
import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types';
import { generatePlan } from '../index';

const request = (overrides: Partial<PlanRequest> = {}): PlanRequest => ({
  ageGroup: 'U10',
  level: 'beginner',
  players: Array.from({ length: 9 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 0,
  equipment: { balls: 12, cones: 40, bibs: 6, goals: 3 },
  space: { width: 70, length: 40 },
  minutes: 15,
  kind: 'match-warm-up',
  seed: 'marks',
  ...overrides,
});

describe('markings', () => {
  it('shots from three finishing stations in a row point away from the others', async () => {
    const plan = await generatePlan(request());
    const pf = plan.phases.find((p) => p.activityKind === 'passing-finishing')!.stations;
    expect(pf).toHaveLength(3);
    for (const s of pf) {
      const goal = s.goalPositions![0];
      // The space behind the goal, from the station's edge to the space's edge, holds no other station.
      const others = pf.filter((o) => o !== s);
      const behind = others.filter((o) => {
        if (goal.facing === 180)
          return (
            o.position.y >= s.position.y + s.area.length &&
            o.position.x < goal.x + 3 &&
            o.position.x + o.area.width > goal.x - 3
          );
        if (goal.facing === 0)
          return (
            o.position.y + o.area.length <= s.position.y &&
            o.position.x < goal.x + 3 &&
            o.position.x + o.area.width > goal.x - 3
          );
        if (goal.facing === 270)
          return (
            o.position.x >= s.position.x + s.area.width &&
            o.position.y < goal.y + 3 &&
            o.position.y + o.area.length > goal.y - 3
          );
        return (
          o.position.x + o.area.width <= s.position.x &&
          o.position.y < goal.y + 3 &&
          o.position.y + o.area.length > goal.y - 3
        );
      });
      expect(behind).toEqual([]);
    }
    expect(plan.warnings.map((w) => w.code)).not.toContain('shots-toward-station');
  });

  it('with 3 cones and 0 goals: never more cones than the bag, and a station that goes without is told what to use', async () => {
    const plan = await generatePlan(request({ equipment: { balls: 12, cones: 3, bibs: 6, goals: 0 } }));
    for (const phase of plan.phases) {
      expect(phase.stations.reduce((n, s) => n + s.equipment.cones, 0)).toBeLessThanOrEqual(3);
    }
    const told = plan.phases
      .flatMap((p) => p.stations)
      .filter((s) => s.notes?.some((n) => /bibs, bags or bottles|end line|end zone/.test(n)));
    expect(told.length).toBeGreaterThan(0);
  });

  it('a keeper stands in the goal: their start position is at the goal mouth', async () => {
    const plan = await generatePlan(
      request({
        ageGroup: 'U12',
        minutes: 25,
        coaches: 2,
        players: Array.from({ length: 12 }, (_, i) => ({ id: `p${i + 1}`, goalkeeper: i < 2 || undefined })),
      }),
    );
    const inGoal = plan.phases
      .flatMap((p) => p.stations)
      .filter((s) => s.activityKind !== 'goalkeeping' && s.roles.goalkeeper?.length);
    expect(inGoal.length).toBeGreaterThan(0);
    for (const s of inGoal) {
      for (const id of s.roles.goalkeeper!) {
        const at = s.positions.find((p) => p.id === id)!;
        expect(at.role).toBe('goalkeeper');
        const goals = s.goalPositions!.filter((g) => g.kind === 'goal');
        expect(goals.some((g) => Math.hypot(g.x - at.x, g.y - at.y) <= 1)).toBe(true);
      }
    }
  });
});
