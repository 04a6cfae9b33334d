/**
 * Worked examples, reasoned by hand from the default rule set (rules/default-rule-set.json):
 * session shapes, group sizes, game formats, keepers, supervision, kit and weather. Facts of the
 * trade are common practice (no single source) unless a source is named.
 */
import { describe, expect, it } from 'vitest';
import type { Plan, PlanRequest } from '../shared/types';
import { checkPlan, defaultRuleSet, generatePlan } from './index';
import { brokenInvariants } from './testing/plan-invariants';

function request(players: number, overrides: Partial<PlanRequest> = {}, keepers = 0): PlanRequest {
  return {
    ageGroup: 'U10',
    level: 'intermediate',
    players: Array.from({ length: players }, (_, i) => ({
      id: `p${i + 1}`,
      ...(i < keepers ? { goalkeeper: true } : {}),
    })),
    coaches: 2,
    equipment: { balls: players, cones: 60, bibs: 16, goals: 4 },
    space: { width: 50, length: 60 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: 'worked',
    ...overrides,
  };
}

const playing = (plan: Plan) => plan.phases.filter((p) => p.activityKind !== 'break');
const stationsOf = (plan: Plan, kind: string) =>
  plan.phases.flatMap((p) => p.stations).filter((s) => s.activityKind === kind);
const codes = (plan: Plan) => plan.warnings.map((w) => w.code);

describe('worked examples', () => {
  it('1 player: nothing with a partner fits, so every part is ball mastery with the one ball', async () => {
    // Passing needs 2, keep-ball 4, speed races 2: each part falls back on its substitutes, and
    // ball mastery (1–12 players) is the one that takes a single player.
    const plan = await generatePlan(request(1, { minutes: 15 }));
    for (const p of playing(plan)) {
      expect(p.stations.map((s) => s.activityKind)).toEqual(['ball-mastery']);
      expect(p.stations[0].equipment.balls).toBe(1);
    }
    expect(brokenInvariants(plan, defaultRuleSet, { strictWaiting: true })).toEqual([]);
  });

  it('9 U8s with a keeper: ball mastery or tag, then duels or dribbling, then two games of at most 4 a side and no keeper', async () => {
    // US Soccer Player Development Initiatives (2016): 4v4 for U6–U8, no goalkeepers. 9 players
    // cannot make one game of 4 a side, so two games of 5 (3v2) and 4 (2v2); the keeper plays out.
    const plan = await generatePlan(
      request(
        9,
        {
          ageGroup: 'U8',
          level: 'beginner',
          equipment: { balls: 10, cones: 40, bibs: 10, goals: 2 },
          space: { width: 40, length: 50 },
        },
        1,
      ),
    );
    const kinds = playing(plan).map((p) => p.activityKind);
    expect(['ball-mastery', 'tag-game']).toContain(kinds[0]);
    expect(kinds.at(-1)).toBe('small-sided-game');
    const games = stationsOf(plan, 'small-sided-game');
    expect(games.map((g) => g.roles.teams!.map((t) => t.length))).toEqual([
      [3, 2],
      [2, 2],
    ]);
    expect(games.every((g) => !g.roles.goalkeeper?.length)).toBe(true);
    const note = plan.warnings.find((w) => w.code === 'keepers-play-out');
    expect(note?.source).toMatch(/US Soccer/);
  });

  it('14 U10s with two keepers: the keepers warm up in their own station, then stand in real goals with a keeper each end or one each group', async () => {
    const plan = await generatePlan(
      request(14, { minutes: 25, equipment: { balls: 14, cones: 50, bibs: 10, goals: 4 } }, 2),
    );
    const phases = playing(plan);
    const warmUp = phases.findIndex((p) => p.stations.some((s) => s.activityKind === 'goalkeeping'));
    const inGoal = phases.findIndex((p) =>
      p.stations.some((s) => s.activityKind !== 'goalkeeping' && s.roles.goalkeeper?.length),
    );
    expect(warmUp).toBeGreaterThanOrEqual(0);
    expect(inGoal).toBeGreaterThan(warmUp);
    for (const p of phases.slice(inGoal)) {
      for (const s of p.stations.filter(
        (x) => x.roles.goalkeeper?.length && x.activityKind !== 'goalkeeping',
      )) {
        // Every keeper in goal has a real goal of their own.
        expect(s.goalPositions!.filter((g) => g.kind === 'goal').length).toBeGreaterThanOrEqual(
          s.roles.goalkeeper!.length,
        );
        if (s.roles.teams) expect(s.roles.goalkeeper).toHaveLength(2);
      }
    }
    // With two keepers and goals, the last game before kick-off has a keeper each end.
    const lastGame = phases.filter((p) => p.activityKind === 'small-sided-game').at(-1);
    if (lastGame) expect(lastGame.stations[0].roles.goalkeeper).toHaveLength(2);
    // A keeper's touches are a keeper's (handling and saves), well under an outfield player's.
    const outfield = Object.entries(plan.touches)
      .filter(([id]) => !['p1', 'p2'].includes(id))
      .map(([, t]) => t);
    expect(plan.touches['p1']).toBeLessThan(Math.min(...outfield));
  });

  it('16 U14s with two keepers and four goals in training: one 8v8 game with a keeper each side, not two lopsided ones', async () => {
    // 16 players: one game of 8 a side is within the 11-a-side format; the two keepers go one
    // each side, each in a real goal.
    const plan = await generatePlan(
      request(16, { ageGroup: 'U14', kind: 'training', minutes: 60, space: { width: 60, length: 80 } }, 2),
    );
    const game = playing(plan).filter((p) => p.activityKind === 'small-sided-game');
    expect(game.length).toBeGreaterThan(0);
    for (const p of game) {
      expect(p.stations).toHaveLength(1);
      const [a, b] = p.stations[0].roles.teams!;
      expect([a.length, b.length]).toEqual([8, 8]);
      expect(p.stations[0].roles.goalkeeper).toHaveLength(2);
      expect(a.filter((id) => ['p1', 'p2'].includes(id))).toHaveLength(1);
    }
    expect(playing(plan).at(-1)!.activityKind).toBe('cool-down');
  });

  it('24 U10s and one adult: at most four stations at a time, and a warning that asks for two more adults', async () => {
    // NSPCC Child Protection in Sport Unit, 1:8 for 9–12 (value from memory): 24 / 8 = 3 adults.
    const plan = await generatePlan(request(24, { coaches: 1 }));
    for (const p of plan.phases) expect(p.stations.length).toBeLessThanOrEqual(4);
    const w = plan.warnings.find((x) => x.code === 'supervision-ratio')!;
    expect(w.message).toContain('at least 3');
    expect(w.message).toContain('Ask 2 parents or helpers');
    expect(plan.supervision).toMatchObject({ children: 24, adults: 1, recommendedAdults: 3, maxStations: 4 });
  });

  it('10 U9s at 2 °C with 5 balls: activities for shared balls, and nobody stands waiting', async () => {
    const plan = await generatePlan(
      request(10, {
        ageGroup: 'U9',
        level: 'beginner',
        equipment: { balls: 5, cones: 30, bibs: 8, goals: 2 },
        space: { width: 30, length: 40 },
        conditions: { temperatureC: 2 },
      }),
    );
    for (const p of playing(plan)) for (const s of p.stations) expect(s.waiting ?? 0).toBe(0);
    const uses = playing(plan).map(
      (p) => defaultRuleSet.parameters.activities.find((a) => a.id === p.activityId)!.balls,
    );
    expect(uses).not.toContain('each');
    expect(codes(plan)).toContain('cold');
  });

  it('a 60-minute U12 training at 30 °C: a drinks break at least every 15 minutes and nothing above intensity 4', async () => {
    const plan = await generatePlan(
      request(12, { ageGroup: 'U12', kind: 'training', minutes: 60, conditions: { temperatureC: 30 } }),
    );
    let run = 0;
    for (const p of plan.phases) {
      run = p.activityKind === 'break' ? 0 : run + p.endMinute - p.startMinute;
      expect(run).toBeLessThanOrEqual(15 + 3);
    }
    expect(plan.phases.filter((p) => p.activityKind === 'break').length).toBeGreaterThanOrEqual(3);
    for (const p of playing(plan)) expect(p.intensity).toBeLessThanOrEqual(4);
    expect(plan.cautions.map((c) => c.code)).toContain('heat');
  });

  it('12 U12s in a 14 × 14 m space: no keep-ball squeezed under 12 m² a player; everyone plays together instead', async () => {
    // Keep-ball squares of 4–6 need at least 8 × 8 m each, and two with a 3 m buffer need 19 m.
    const plan = await generatePlan(
      request(12, { ageGroup: 'U12', coaches: 1, space: { width: 14, length: 14 } }),
    );
    for (const s of stationsOf(plan, 'keep-ball')) {
      expect(s.area.width * s.area.length).toBeGreaterThanOrEqual(12 * (s.playerIds.length + s.coachJoins));
    }
    expect(codes(plan)).toContain('space-too-small');
    expect(checkPlan(plan)).toEqual([]);
  });

  it('no goals in the bag: keepers play out, shooting goes at gates of two cones, and the coach is told', async () => {
    const plan = await generatePlan(
      request(12, { equipment: { balls: 12, cones: 60, bibs: 12, goals: 0 } }, 2),
    );
    expect(plan.phases.flatMap((p) => p.stations).every((s) => !s.roles.goalkeeper?.length)).toBe(true);
    expect(codes(plan)).toEqual(expect.arrayContaining(['keepers-no-goal', 'gates-instead-of-goals']));
  });

  it('a focus changes the activities, not only their minutes: each theme puts its own kinds in technical and opposed practice', async () => {
    const base = request(14, {
      ageGroup: 'U12',
      kind: 'training',
      minutes: 60,
      space: { width: 60, length: 80 },
    });
    const themes = defaultRuleSet.parameters.themes;
    const seen = new Set<string>();
    for (const focus of ['passing', 'dribbling', 'finishing', 'pressing'] as const) {
      const plan = await generatePlan({ ...base, focus: [focus] });
      expect(plan.theme).toBe(focus);
      const technical = plan.phases.find((p) => p.slot === 'technical')!;
      const opposed = plan.phases.find((p) => p.slot === 'opposed')!;
      expect(themes[focus].technical).toContain(technical.activityKind);
      expect(themes[focus].opposed).toContain(opposed.activityKind);
      seen.add(`${technical.activityId}/${opposed.activityId}`);
    }
    expect(seen.size).toBe(4);
  });
});

describe('variety: ten plans in a row for one team, each told the last two plans’ activities', () => {
  const teams: [string, PlanRequest][] = [
    ['U10 match warm-ups', request(14, { minutes: 25 })],
    ['U8 match warm-ups', request(10, { ageGroup: 'U8', level: 'beginner', minutes: 20 })],
    [
      'U14 training',
      request(16, { ageGroup: 'U14', kind: 'training', minutes: 60, space: { width: 60, length: 80 } }, 2),
    ],
    [
      'adult training',
      request(
        18,
        {
          ageGroup: 'adult',
          level: 'advanced',
          kind: 'training',
          minutes: 75,
          space: { width: 60, length: 90 },
        },
        2,
      ),
    ],
  ];
  for (const [name, team] of teams) {
    it(`${name} use at least 12 different activities`, async () => {
      const history: string[][] = [];
      const used = new Set<string>();
      for (let week = 0; week < 10; week++) {
        const recent = [...(history.at(-1) ?? []), ...(history.at(-2) ?? [])];
        const plan = await generatePlan({
          ...team,
          seed: `week-${week}`,
          recentActivityIds: [...new Set(recent)],
        });
        const ids = [...new Set(plan.phases.flatMap((p) => p.stations.map((s) => s.activityId)))];
        history.push(ids);
        for (const id of ids) used.add(id);
      }
      expect(used.size).toBeGreaterThanOrEqual(12);
    });
  }
});
