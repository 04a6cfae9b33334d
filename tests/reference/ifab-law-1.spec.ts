/**
 * Source: IFAB Laws of the Game, Law 1 (The Field of Play) — touchline 90–120 m, goal line
 * 45–90 m (the Law's yards: 100–130 yd and 50–100 yd), goal 7.32 m × 2.44 m, centre-circle radius
 * 9.15 m, penalty area 16.5 m from the goal line.
 */
import { describe, expect, it } from 'vitest';
import { IFAB_LAW_1, spacePresetsFor } from '../../shared/pitch/pitch-standards';
import type { PlanRequest } from '../../shared/types';
import { generatePlan, validatePlanRequest } from '../../engine';

describe('IFAB Laws of the Game, Law 1', () => {
  it('shared geometry constants match the Law', () => {
    expect(IFAB_LAW_1).toEqual({
      touchlineM: { min: 90, max: 120 },
      goalLineM: { min: 45, max: 90 },
      goalWidthM: 7.32,
      goalHeightM: 2.44,
      centreCircleRadiusM: 9.15,
      penaltyAreaDepthM: 16.5,
    });
  });

  it('the 11v11 preset lies within the Law’s ranges; a maximal pitch is a valid space', async () => {
    const full = spacePresetsFor('U15')[0].space;
    // The same pitch in the Law's yards (100–130 × 50–100 yd): the middle, whole yards.
    const yards = spacePresetsFor('U15', 'yards')[0];
    expect(yards.size).toEqual({ width: 75, length: 115 });
    expect(yards.source).toBe('IFAB Laws of the Game, Law 1');
    expect(full.length).toBeGreaterThanOrEqual(IFAB_LAW_1.touchlineM.min);
    expect(full.length).toBeLessThanOrEqual(IFAB_LAW_1.touchlineM.max);
    expect(full.width).toBeGreaterThanOrEqual(IFAB_LAW_1.goalLineM.min);
    expect(full.width).toBeLessThanOrEqual(IFAB_LAW_1.goalLineM.max);
    const request: PlanRequest = {
      ageGroup: 'adult',
      level: 'advanced',
      players: Array.from({ length: 22 }, (_, i) => ({ id: `p${i}`, goalkeeper: i < 2 })),
      coaches: 2,
      equipment: { balls: 22, cones: 80, bibs: 11, goals: 4 },
      space: { width: IFAB_LAW_1.goalLineM.max, length: IFAB_LAW_1.touchlineM.max },
      minutes: 25,
      kind: 'match-warm-up',
      seed: 'law-1',
    };
    expect(validatePlanRequest(request).ok).toBe(true);
    const plan = await generatePlan(request);
    for (const s of plan.phases.flatMap((p) => p.stations)) {
      expect(s.position.x + s.area.width).toBeLessThanOrEqual(request.space.width);
      expect(s.position.y + s.area.length).toBeLessThanOrEqual(request.space.length);
    }
  });
});
