/**
 * Worked examples, reasoned by hand from the default rule set (rules/default-rule-set.json).
 * Group sizes: ball-mastery 1–10 (preferred 6), passing-finishing 3–4 (3), pairs 2–3 (2),
 * keep-ball beginner/intermediate 4v1, 3v1, 5v2, 4v2 (preferred 4v1), advanced 6v2, 5v2.
 * Allocation cost = Σ|size − preferred| + 1.5 per coach fill-in + 3 per leftover station.
 */
import { describe, expect, it } from 'vitest';
import type { Phase, PlanRequest } from '../shared/types';
import { defaultRuleSet, generatePlan } from './index';
import { brokenInvariants } from './testing/plan-invariants';

function request(players: number, overrides: Partial<PlanRequest> = {}): PlanRequest {
  return {
    ageGroup: 'U10',
    level: 'beginner',
    players: Array.from({ length: players }, (_, i) => ({ id: `p${i + 1}` })),
    coaches: 0,
    equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
    space: { width: 60, length: 40 },
    minutes: 15,
    kind: 'match-warm-up',
    seed: 'worked',
    ...overrides,
  };
}

const sizes = (phase: Phase) =>
  phase.stations.map((s) => `${s.activityKind}:${s.playerIds.length}+${s.coachJoins}`);
const ruleFired = (trace: { ruleId: string; fired: boolean }[], id: string) =>
  trace.find((t) => t.ruleId === id)?.fired;

describe('worked examples', () => {
  it('1 player: keep-ball and passing are impossible, so the whole warm-up is ball-mastery', async () => {
    // Keep-ball is forbidden (< 3 players); passing-finishing needs 3 and pairs 2, so both fall
    // back to ball-mastery and merge into one 15-minute phase with one ball.
    const plan = await generatePlan(request(1));
    expect(plan.phases.map((p) => [p.startMinute, p.endMinute])).toEqual([[0, 15]]);
    expect(sizes(plan.phases[0])).toEqual(['ball-mastery:1+0']);
    expect(plan.phases[0].stations[0].equipment.balls).toBe(1);
    expect(ruleFired(plan.trace, 'numbers.too-few-for-keep-ball')).toBe(true);
    expect(plan.touches).toEqual({ p1: 15 * 8 }); // 8 touches a minute for ball-mastery
  });

  it('2 players and a coach: the coach makes a passing three', async () => {
    // Ball-mastery: one group of 2. Passing: 2 + coach = 3 (cost 1.5) is the only way.
    // Keep-ball is forbidden and falls back to passing: shares 35 and 65 of 15 are 5.25 and 9.75
    // minutes; largest remainder gives 5 and 10.
    const plan = await generatePlan(request(2, { coaches: 1 }));
    expect(plan.phases.map((p) => [p.startMinute, p.endMinute])).toEqual([
      [0, 5],
      [5, 15],
    ]);
    expect(sizes(plan.phases[0])).toEqual(['ball-mastery:2+0']);
    expect(sizes(plan.phases[1])).toEqual(['passing-finishing:2+1']);
  });

  it('5 players, no coach: passing three plus a pair, keep-ball 4v1', async () => {
    // Passing: 5 does not split into 3–4s; leftovers: 3 + pairs 2 costs 3, 4 + a lone
    // ball-mastery player costs 1 + 5 + 3 = 9. Keep-ball: 5 = 4v1 exactly.
    const plan = await generatePlan(request(5));
    expect(plan.phases.map(sizes)).toEqual([
      ['ball-mastery:5+0'],
      ['passing-finishing:3+0', 'pairs:2+0'],
      ['keep-ball:5+0'],
    ]);
    const kb = plan.phases[2].stations[0];
    expect([kb.roles.attackers?.length, kb.roles.defenders?.length]).toEqual([4, 1]);
    expect(plan.phases.map((p) => p.endMinute - p.startMinute)).toEqual([5, 5, 5]);
  });

  it('5 players and a free coach: the coach joins instead of a separate pair', async () => {
    // 5 + coach = 3 + 3 costs 1.5, cheaper than the leftover pair (3).
    const plan = await generatePlan(request(5, { coaches: 1 }));
    expect(sizes(plan.phases[1]).sort()).toEqual(['passing-finishing:2+1', 'passing-finishing:3+0']);
  });

  it('7 intermediate U12s with a coach: passing 4 + 3, keep-ball 5v2', async () => {
    // Passing: 4 + 3 costs 1 (one player waits in the four), 4 + (3 + coach) costs 3.5.
    // Keep-ball: 7 in one group is 5v2 (cost 2); 4 + (3 + coach) would cost 3.5.
    const plan = await generatePlan(request(7, { ageGroup: 'U12', level: 'intermediate', coaches: 1 }));
    expect(sizes(plan.phases[1])).toEqual(['passing-finishing:4+0', 'passing-finishing:3+0']);
    expect(plan.phases[1].stations.map((s) => s.waiting)).toEqual([1, 0]);
    const kb = plan.phases[2].stations;
    expect(kb.map((s) => [s.roles.attackers?.length, s.roles.defenders?.length])).toEqual([[5, 2]]);
    expect(plan.cautions.map((c) => c.code)).toContain('heading-limited');
  });

  it('11 beginners: ball-mastery 6 + 5, passing 4 + 4 + 3, keep-ball 4v2 and 4v1', async () => {
    const plan = await generatePlan(request(11));
    expect(plan.phases.map(sizes)).toEqual([
      ['ball-mastery:6+0', 'ball-mastery:5+0'],
      ['passing-finishing:4+0', 'passing-finishing:4+0', 'passing-finishing:3+0'],
      ['keep-ball:6+0', 'keep-ball:5+0'],
    ]);
    const formats = plan.phases[2].stations.map(
      (s) => `${s.roles.attackers?.length}v${s.roles.defenders?.length}`,
    );
    expect(formats).toEqual(['4v2', '4v1']);
    // Four goals for three finishing stations: every one gets a real goal.
    expect(plan.phases[1].stations.every((s) => s.equipment.goals === 1)).toBe(true);
  });

  it('13 advanced U14s: movement preparation first, keep-ball 6v2 with two pairs beside it', async () => {
    // Advanced keep-ball is 7 or 8 a group; 13 cannot split, so 8 play 6v2 and the other five
    // play pairs 3 + 2 (cost 0 + 1 + 2 × 3 = 7; 5v2 with passing 3 + 3 ties at 7 and comes later).
    const plan = await generatePlan(request(13, { ageGroup: 'U14', level: 'advanced', minutes: 20 }));
    expect(plan.phases.map((p) => p.name)).toEqual([
      'Movement preparation',
      'Arrival touches',
      'Pass and finish',
      'Keep-ball',
    ]);
    // Shares 20/20/30/30 of 20 minutes: 4, 4, 6, 6.
    expect(plan.phases.map((p) => p.endMinute - p.startMinute)).toEqual([4, 4, 6, 6]);
    expect(sizes(plan.phases[0])).toEqual(['movement-prep:13+0']);
    expect(sizes(plan.phases[2])).toEqual([
      'passing-finishing:4+0',
      'passing-finishing:3+0',
      'passing-finishing:3+0',
      'passing-finishing:3+0',
    ]);
    expect(sizes(plan.phases[3])).toEqual(['keep-ball:8+0', 'pairs:3+0', 'pairs:2+0']);
    const kb = plan.phases[3].stations[0];
    expect([kb.roles.attackers?.length, kb.roles.defenders?.length]).toEqual([6, 2]);
    expect(ruleFired(plan.trace, 'age.movement-prep-u13-match')).toBe(true);
    expect(plan.cautions.map((c) => c.code)).not.toContain('heading-none');
  });

  it('17 intermediate U11s with a coach: six passing threes (coach in one), keep-ball 6 + 6 + 5', async () => {
    // Passing: 6 threes with the coach in one costs 1.5; 4+4+3+3+3 costs 2.
    // Keep-ball: 6 + 6 + 5 costs 2; 5 + 4 + 4 + 4 costs 3. Ball-mastery 6 + 6 + 5 costs 1.
    const plan = await generatePlan(
      request(17, {
        ageGroup: 'U11',
        level: 'intermediate',
        coaches: 1,
        equipment: { balls: 20, cones: 80, bibs: 12, goals: 4 },
        space: { width: 80, length: 60 },
      }),
    );
    expect(sizes(plan.phases[0])).toEqual(['ball-mastery:6+0', 'ball-mastery:6+0', 'ball-mastery:5+0']);
    const pf = sizes(plan.phases[1]);
    expect(pf).toHaveLength(6);
    expect(pf.filter((s) => s === 'passing-finishing:3+0')).toHaveLength(5);
    expect(pf).toContain('passing-finishing:2+1');
    expect(sizes(plan.phases[2])).toEqual(['keep-ball:6+0', 'keep-ball:6+0', 'keep-ball:5+0']);
    // Four goals for six finishing groups: two finish through cone gates.
    const targets = plan.phases[1].stations.flatMap((s) => s.goalPositions ?? []);
    expect(targets.filter((t) => t.kind === 'goal')).toHaveLength(4);
    expect(targets.filter((t) => t.kind === 'gate')).toHaveLength(2);
  });

  it('no cones: nothing needs a cone, goals still serve finishing, the coach is told', async () => {
    // Finishing stations are limited by targets: 2 goals, no gates → at most 2 passing stations;
    // 10 players → 4 + 4 passing and a pair.
    const plan = await generatePlan(request(10, { equipment: { balls: 12, cones: 0, bibs: 6, goals: 2 } }));
    expect(
      plan.phases.every((p) =>
        p.stations.every((s) => s.equipment.cones === 0 && s.conePositions.length === 0),
      ),
    ).toBe(true);
    expect(sizes(plan.phases[1])).toEqual(['passing-finishing:4+0', 'passing-finishing:4+0', 'pairs:2+0']);
    expect(plan.warnings.map((w) => w.code)).toContain('no-cones');
    expect(plan.equipmentNeeded.cones).toBe(0);
  });

  it('no goals: cone gates instead, no goal caution', async () => {
    const plan = await generatePlan(request(9, { equipment: { balls: 12, cones: 40, bibs: 6, goals: 0 } }));
    const stations = plan.phases.flatMap((p) => p.stations);
    expect(stations.every((s) => s.equipment.goals === 0)).toBe(true);
    const pf = plan.phases[1].stations;
    expect(pf.every((s) => s.goalPositions?.length === 1 && s.goalPositions[0].kind === 'gate')).toBe(true);
    expect(plan.warnings.map((w) => w.code)).toContain('gates-instead-of-goals');
    expect(plan.cautions.map((c) => c.code)).not.toContain('goals-anchored');
  });

  it('no goals and no cones: nothing to finish at, so passing becomes pairs', async () => {
    const plan = await generatePlan(request(8, { equipment: { balls: 12, cones: 0, bibs: 6, goals: 0 } }));
    expect(ruleFired(plan.trace, 'kit.no-target')).toBe(true);
    expect(plan.phases.flatMap((p) => p.stations).some((s) => s.activityKind === 'passing-finishing')).toBe(
      false,
    );
    expect(plan.phases[1].stations.every((s) => s.activityKind === 'pairs')).toBe(true);
  });

  it('no coach: nobody joins a group', async () => {
    const plan = await generatePlan(request(13, { coaches: 0 }));
    expect(plan.phases.flatMap((p) => p.stations).every((s) => s.coachJoins === 0)).toBe(true);
    expect(brokenInvariants(plan, defaultRuleSet)).toEqual([]);
  });

  it('a tiny space (10 × 10 m, 12 players): one shared grid per phase, with a warning', async () => {
    // Two ball-mastery grids need at least 8 + 1 + 8 m; one grid holds at most 10, so everyone
    // shares one 10 × 10 m grid. The small-space rule cuts the buffer to 1 m.
    const plan = await generatePlan(request(12, { ageGroup: 'U9', space: { width: 10, length: 10 } }));
    for (const phase of plan.phases) {
      expect(phase.stations).toHaveLength(1);
      expect(phase.stations[0].playerIds).toHaveLength(12);
      expect(phase.stations[0].area).toEqual({ width: 10, length: 10 });
    }
    expect(plan.warnings.map((w) => w.code)).toContain('space-too-small');
    expect(ruleFired(plan.trace, 'space.tiny')).toBe(true);
  });

  it('60 players: ten ball-mastery grids of six, twelve 4v1 keep-ball squares, all inside the space', async () => {
    const plan = await generatePlan(
      request(60, {
        ageGroup: 'U12',
        level: 'intermediate',
        coaches: 3,
        equipment: { balls: 60, cones: 150, bibs: 30, goals: 6 },
        space: { width: 100, length: 70 },
        minutes: 30,
      }),
    );
    expect(brokenInvariants(plan, defaultRuleSet)).toEqual([]);
    expect(sizes(plan.phases[0])).toEqual(Array(10).fill('ball-mastery:6+0'));
    expect(sizes(plan.phases[2])).toEqual(Array(12).fill('keep-ball:5+0'));
    expect(plan.warnings.map((w) => w.code)).toContain('large-squad');
    expect(Object.keys(plan.touches)).toHaveLength(60);
  });
});
