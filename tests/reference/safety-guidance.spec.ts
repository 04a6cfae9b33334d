/**
 * Sources:
 * - US Soccer player safety guidance on heading (2015–16): no heading in practice or games for
 *   U11 and younger; for U12–U13 at most 30 minutes of heading training a week and 15–20 headers
 *   per player a week.
 * - US Consumer Product Safety Commission, Guidelines for Movable Soccer Goal Safety: movable goals
 *   anchored or weighted, never climbed.
 */
import { describe, expect, it } from 'vitest';
import type { AgeGroup, PlanRequest } from '../../shared/types';
import { generatePlan } from '../../engine';

function request(ageGroup: AgeGroup, goals = 2): PlanRequest {
  return {
    ageGroup,
    level: 'intermediate',
    players: Array.from({ length: 10 }, (_, i) => ({ id: `p${i}` })),
    coaches: 1,
    equipment: { balls: 10, cones: 40, bibs: 6, goals },
    space: { width: 50, length: 40 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: 'safety',
  };
}

describe('US Soccer heading guidance (2015–16)', () => {
  it('U6–U11: a no-heading caution citing the guidance', async () => {
    for (const age of ['U6', 'U9', 'U11'] as AgeGroup[]) {
      const caution = (await generatePlan(request(age))).cautions.find((c) => c.code === 'heading-none');
      expect(caution?.message).toMatch(/No heading/);
      expect(caution?.source).toMatch(/US Soccer.*2015–16/);
    }
  });

  it('U12–U13: limited heading — 30 minutes a week, 15–20 headers per player a week', async () => {
    for (const age of ['U12', 'U13'] as AgeGroup[]) {
      const plan = await generatePlan(request(age));
      const caution = plan.cautions.find((c) => c.code === 'heading-limited');
      expect(caution?.message).toContain('30 minutes a week');
      expect(caution?.message).toContain('15–20 headers per player a week');
      expect(plan.cautions.map((c) => c.code)).not.toContain('heading-none');
    }
  });

  it('U14 and older: no heading caution from this guidance', async () => {
    const codes = (await generatePlan(request('U14'))).cautions.map((c) => c.code);
    expect(codes).not.toContain('heading-none');
    expect(codes).not.toContain('heading-limited');
  });
});

describe('US CPSC Guidelines for Movable Soccer Goal Safety', () => {
  it('goals in use: anchor or weight them and never climb, citing the CPSC', async () => {
    const plan = await generatePlan(request('U10', 2));
    expect(plan.phases.flatMap((p) => p.stations).some((s) => s.equipment.goals > 0)).toBe(true);
    const caution = plan.cautions.find((c) => c.code === 'goals-anchored');
    expect(caution?.message).toMatch(/Anchor or weight/);
    expect(caution?.message).toMatch(/never let anyone climb/);
    expect(caution?.source).toBe(
      'US Consumer Product Safety Commission, Guidelines for Movable Soccer Goal Safety',
    );
  });

  it('no goals: no goal caution, but the standing note on conditions, local rules, safeguarding and first aid', async () => {
    const plan = await generatePlan(request('U10', 0));
    const codes = plan.cautions.map((c) => c.code);
    expect(codes).not.toContain('goals-anchored');
    const standing = plan.cautions.find((c) => c.code === 'coach-judges');
    expect(standing?.message).toMatch(/local rules.*safeguarding policy.*first aid/);
  });
});
