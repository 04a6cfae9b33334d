/**
 * Facts of the trade with no single published source (common practice, no single source):
 * keep-ball about 4v1 or 3v1 for most youth groups and 5v2 or 6v2 for advanced players, never
 * 5v1 or worse; 50–100 touches per player before kick-off; passing and finishing in threes;
 * players of 12 and under warm up with a ball from the first minute.
 */
import { describe, expect, it } from 'vitest';
import { defaultRuleSet, generatePlan } from '../../engine';
import type { PlanRequest } from '../../shared/types';

const p = defaultRuleSet.parameters;

describe('common practice, no single source', () => {
  it('keep-ball formats: 4v1/3v1 for beginners and intermediates, 6v2/5v2 for advanced, none worse than 4v1', () => {
    const fmt = (level: 'beginner' | 'intermediate' | 'advanced') =>
      p.keepBall[level].formats.map((f) => `${f.attackers}v${f.defenders}`);
    expect(fmt('beginner').slice(0, 2)).toEqual(['4v1', '3v1']);
    expect(fmt('intermediate').slice(0, 2)).toEqual(['4v1', '3v1']);
    expect(fmt('advanced')).toEqual(['6v2', '5v2']);
    for (const level of ['beginner', 'intermediate', 'advanced'] as const) {
      for (const f of p.keepBall[level].formats) expect(f.attackers / f.defenders).toBeLessThanOrEqual(4);
    }
  });

  it('passing and finishing in threes', () => {
    for (const level of ['beginner', 'intermediate', 'advanced'] as const) {
      expect(p.groupSizes['passing-finishing'][level].preferred).toBe(3);
    }
  });

  it('touch target 50–100 before kick-off; a 15-minute U10 warm-up with a ball each meets it (estimate)', async () => {
    expect([p.touchTarget.minPerPlayer, p.touchTarget.maxPerPlayer]).toEqual([50, 100]);
    const request: PlanRequest = {
      ageGroup: 'U10',
      level: 'beginner',
      players: Array.from({ length: 12 }, (_, i) => ({ id: `p${i}` })),
      coaches: 1,
      equipment: { balls: 12, cones: 40, bibs: 6, goals: 2 },
      space: { width: 50, length: 40 },
      minutes: 15,
      kind: 'match-warm-up',
      seed: 'touches',
    };
    const plan = await generatePlan(request);
    for (const t of Object.values(plan.touches)) expect(t).toBeGreaterThanOrEqual(50);
    expect(plan.warnings.map((w) => w.code)).not.toContain('touches-below-target');
    expect(plan.estimateNote).toMatch(/estimates/);
  });

  it('a warm-up for 12 and under starts with the ball: the first phase is ball-mastery, no movement-prep', async () => {
    const plan = await generatePlan({
      ageGroup: 'U12',
      level: 'beginner',
      players: Array.from({ length: 9 }, (_, i) => ({ id: `p${i}` })),
      coaches: 0,
      equipment: { balls: 9, cones: 30, bibs: 4, goals: 1 },
      space: { width: 40, length: 30 },
      minutes: 20,
      kind: 'match-warm-up',
      seed: 'ball-first',
    });
    expect(plan.phases[0].stations.every((s) => s.activityKind === 'ball-mastery')).toBe(true);
  });
});
