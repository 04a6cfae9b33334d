/**
 * Children per adult, as the NSPCC Child Protection in Sport Unit's guidance gives them:
 * 1:6 for 8 and under, 1:8 for 9–12, 1:10 for 13–18, and at least two adults. These values are
 * from memory, not checked against the current document: a club should check its own
 * association's guidance (the plan's warning says so too). One adult overseeing about four
 * stations is common practice (no single source).
 */
import { describe, expect, it } from 'vitest';
import { defaultRuleSet, generatePlan } from '../../engine';
import type { AgeGroup, PlanRequest } from '../../shared/types';

const supervision = defaultRuleSet.parameters.supervision;

function request(ageGroup: AgeGroup, players: number, coaches: number): PlanRequest {
  return {
    ageGroup,
    level: 'intermediate',
    players: Array.from({ length: players }, (_, i) => ({ id: `p${i + 1}` })),
    coaches,
    equipment: { balls: players, cones: 60, bibs: 12, goals: 2 },
    space: { width: 60, length: 60 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: 'ratios',
  };
}

describe('NSPCC Child Protection in Sport Unit ratios (values from memory)', () => {
  it('the rule set holds 1:6 to age 8, 1:8 to 12, 1:10 to 18, at least two adults, and says its values are from memory', () => {
    expect(supervision.ratios).toEqual([
      { upToAge: 8, childrenPerAdult: 6 },
      { upToAge: 12, childrenPerAdult: 8 },
      { upToAge: 18, childrenPerAdult: 10 },
    ]);
    expect(supervision.minAdults).toBe(2);
    expect(supervision.source).toMatch(/NSPCC.*from memory/);
  });

  it('worked: 13 U8s need 3 adults (13 / 6 rounds up), 17 U12s 3, 21 U16s 3, 8 U10s still 2', async () => {
    for (const [age, n, need] of [
      ['U8', 13, 3],
      ['U12', 17, 3],
      ['U16', 21, 3],
      ['U10', 8, 2],
    ] as [AgeGroup, number, number][]) {
      const plan = await generatePlan(request(age, n, 1));
      expect(plan.supervision?.recommendedAdults).toBe(need);
      expect(plan.supervision?.ratio).toBe(`1:${age === 'U8' ? 6 : age === 'U16' ? 10 : 8}`);
      expect(plan.warnings.find((w) => w.code === 'supervision-ratio')?.source).toMatch(/NSPCC/);
    }
  });

  it('common practice: one adult oversees about four stations, so one adult never gets more than four at once', async () => {
    expect(supervision.stationsPerAdult).toBe(4);
    const plan = await generatePlan(request('U10', 24, 1));
    for (const phase of plan.phases) expect(phase.stations.length).toBeLessThanOrEqual(4);
  });
});
