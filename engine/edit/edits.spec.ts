/** Coach edits, pitch-side progressions and the re-check of edited plans. */
import { describe, expect, it } from 'vitest';
import type { Plan, PlanRequest } from '../../shared/types';
import {
  applyEdit,
  applyProgression,
  checkPlan,
  defaultRuleSet,
  generatePlan,
  listActivities,
} from '../index';

const base: PlanRequest = {
  ageGroup: 'U10',
  level: 'beginner',
  players: Array.from({ length: 11 }, (_, i) => ({ id: `p${i + 1}`, name: `Player ${i + 1}` })),
  coaches: 0,
  equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
  space: { width: 60, length: 40 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'edits',
};

const phaseOf = (plan: Plan, kind: string) => plan.phases.findIndex((p) => p.activityKind === kind);
const codes = (notices: { code: string }[]) => notices.map((n) => n.code);
const table = defaultRuleSet.parameters.areas;

describe('checkPlan', () => {
  it('finds nothing wrong with a fresh plan', async () => {
    expect(checkPlan(await generatePlan(base))).toEqual([]);
  });

  it('names a player in two groups, a missing player, overlap, kit over the bag and an activity not for the age', async () => {
    const plan = structuredClone(await generatePlan(base));
    const pp = plan.phases[phaseOf(plan, 'passing-pattern')];
    const [a, b] = pp.stations;
    b.playerIds.push(a.playerIds[0]);
    const kb = plan.phases[phaseOf(plan, 'keep-ball')];
    kb.stations[0].playerIds.pop();
    kb.stations[1].position = { ...kb.stations[0].position };
    plan.phases[0].stations[0].equipment.balls = 99;
    plan.phases[0].stations[0].activityKind = 'movement-prep';
    expect(codes(checkPlan(plan))).toEqual(
      expect.arrayContaining([
        'player-twice',
        'player-missing',
        'stations-overlap',
        'kit-over',
        'activity-not-for-age',
      ]),
    );
  });

  it('flags keep-ball with more than four attackers a defender (5v1), in a coach’s words', async () => {
    const plan = structuredClone(await generatePlan(base));
    const kb = plan.phases[phaseOf(plan, 'keep-ball')].stations.find((s) => s.roles.defenders?.length === 1)!;
    kb.roles.attackers!.push('extra');
    kb.playerIds.push('extra');
    const notice = checkPlan(plan).find((n) => n.code === 'keep-ball-ratio');
    // Named by its activity, as the plan page heads the station; the level in words.
    expect(notice?.message).toContain(`‘${kb.title}’`);
    expect(notice?.message).toMatch(
      /: 5v1 — keep-ball for (beginners|intermediate players|advanced players) /,
    );
    expect(notice?.message).not.toMatch(/p\d-s\d/);
  });

  it('flags a keeper placed where no real goal stands, and uneven sides in a game', async () => {
    const plan = structuredClone(
      await generatePlan({
        ...base,
        ageGroup: 'U12',
        kind: 'training',
        minutes: 45,
        players: base.players.map((p, i) => ({ ...p, goalkeeper: i < 2 || undefined })),
        space: { width: 60, length: 80 },
      }),
    );
    const game = plan.phases
      .flatMap((p) => p.stations)
      .find((s) => s.activityKind === 'small-sided-game' && s.roles.goalkeeper?.length)!;
    expect(game).toBeDefined();
    game.goalPositions = game.goalPositions!.map((g) => ({ ...g, kind: 'gate' as const }));
    game.roles.teams![0].push(...game.roles.teams![1].splice(0, 2));
    expect(codes(checkPlan(plan))).toEqual(expect.arrayContaining(['keeper-without-goal', 'sides-uneven']));
  });

  it('flags a station outside the space', async () => {
    const plan = structuredClone(await generatePlan(base));
    plan.phases[0].stations[0].position = { x: 55, y: 0 };
    expect(codes(checkPlan(plan))).toContain('station-outside-space');
  });
});

describe('applyEdit', () => {
  it('moves a player and re-assigns keep-ball roles by the club’s formats', async () => {
    const plan = await generatePlan(base);
    const pi = phaseOf(plan, 'keep-ball');
    const [first, second] = plan.phases[pi].stations;
    const [from, to] = first.playerIds.length >= second.playerIds.length ? [first, second] : [second, first];
    const mover = from.roles.attackers![0];
    const edited = await applyEdit(plan, {
      type: 'move-player',
      playerId: mover,
      toStationId: to.id,
      phaseIndex: pi,
    });
    const grown = edited.phases[pi].stations.find((s) => s.id === to.id)!;
    expect(grown.playerIds).toContain(mover);
    // Beginners' formats: 4v1, 3v1, 5v2, 4v2; a group of n takes the one that adds up to n.
    const n = grown.playerIds.length + grown.coachJoins;
    const format = defaultRuleSet.parameters.keepBall.beginner.formats.find(
      (f) => f.attackers + f.defenders === n,
    )!;
    expect([grown.roles.attackers!.length + grown.coachJoins, grown.roles.defenders!.length]).toEqual([
      format.attackers,
      format.defenders,
    ]);
    expect(grown.format).toBe(`${format.attackers}v${format.defenders}`);
    expect(grown.positions.filter((p) => p.role === 'defender')).toHaveLength(format.defenders);
    expect(edited.trace.at(-1)).toMatchObject({ ruleId: 'edit.move-player', fired: true });
  });

  it('resizes a keep-ball area one step smaller (harder) within the rule bounds', async () => {
    const plan = await generatePlan(base);
    const pi = phaseOf(plan, 'keep-ball');
    const st = plan.phases[pi].stations[0];
    const edited = await applyEdit(plan, {
      type: 'resize-area',
      stationId: st.id,
      phaseIndex: pi,
      step: 'smaller',
    });
    const now = edited.phases[pi].stations.find((s) => s.id === st.id)!;
    expect(Math.min(now.area.width, now.area.length)).toBe(
      Math.min(st.area.width, st.area.length) - table['keep-ball']['U9-U10'].step,
    );
    expect(checkPlan(edited)).toEqual([]);
  });

  it('swaps a phase to another allowed activity, redrawn by its kind, and refuses one not for the age', async () => {
    const plan = await generatePlan(base);
    const pi = phaseOf(plan, 'passing-pattern');
    const swapped = await applyEdit(plan, {
      type: 'swap-activity',
      phaseIndex: pi,
      activityId: 'rt-open-up-middle',
    });
    expect(swapped.phases[pi].activityId).toBe('rt-open-up-middle');
    for (const s of swapped.phases[pi].stations.filter((x) => x.activityKind === 'receiving-turning')) {
      expect(s.positions.map((p) => p.role)).toEqual(expect.arrayContaining(['server', 'attacker']));
    }
    expect(checkPlan(swapped)).toEqual([]);
    const refused = await applyEdit(plan, {
      type: 'swap-activity',
      phaseIndex: pi,
      activityId: 'mp-lunge-twist-go',
    });
    expect(refused.phases).toEqual(plan.phases);
    expect(codes(refused.warnings)).toContain('swap-refused');
  });

  it('regenerates with a new seed, or the same plan for the same seed', async () => {
    const plan = await generatePlan(base);
    const same = await applyEdit(plan, { type: 'regenerate', seed: 'edits' });
    expect(JSON.stringify(same)).toBe(JSON.stringify(plan));
    const other = await applyEdit(plan, { type: 'regenerate' });
    expect(other.seed).not.toBe('edits');
  });
});

describe('applyProgression', () => {
  it('too easy in keep-ball: area one step smaller, with a trace entry; too hard: larger', async () => {
    const plan = await generatePlan(base);
    const pi = phaseOf(plan, 'keep-ball');
    const st = plan.phases[pi].stations[1];
    const harder = applyProgression(plan, pi, st.id, 'too-easy');
    const side = (a: { width: number; length: number }) => Math.min(a.width, a.length);
    expect(side(harder.phases[pi].stations[1].area)).toBe(side(st.area) - 2);
    expect(harder.trace.at(-1)?.effect).toMatch(/too easy: area/);
    const easier = applyProgression(plan, pi, st.id, 'too-hard');
    expect(side(easier.phases[pi].stations[1].area)).toBe(side(st.area) + 2);
  });

  it('too easy in passing and finishing makes the area larger (longer passes and shots)', async () => {
    const plan = await generatePlan({ ...base, pinnedActivityIds: ['pf-set-and-strike'] });
    const pi = phaseOf(plan, 'passing-finishing');
    const st = plan.phases[pi].stations[0];
    const harder = applyProgression(plan, pi, st.id, 'too-easy');
    const now = harder.phases[pi].stations[0].area;
    expect(Math.min(now.width, now.length)).toBeGreaterThan(Math.min(st.area.width, st.area.length));
  });

  it('stops at the keep-ball room limit: 12 m² a player and 8 m a side, whatever the table’s minimum', async () => {
    let plan = await generatePlan(base);
    const pi = phaseOf(plan, 'keep-ball');
    const id = plan.phases[pi].stations[0].id;
    for (let i = 0; i < 10; i++) plan = applyProgression(plan, pi, id, 'too-easy');
    const s = plan.phases[pi].stations[0];
    const n = s.playerIds.length + s.coachJoins;
    // √(12 × n) rounded up: 5 players → 8 m (and never under 8), 6 → 9 m.
    expect(Math.min(s.area.width, s.area.length)).toBe(Math.max(8, Math.ceil(Math.sqrt(12 * n))));
    expect(plan.trace.at(-1)).toMatchObject({ fired: false });
  });
});

describe('recent feedback', () => {
  it('keep-ball that was too easy at 12 m starts at 10 m next time, and the trace says why', async () => {
    const plan = await generatePlan({
      ...base,
      recentFeedback: [{ activityKind: 'keep-ball', verdict: 'too-easy', areaWidth: 12, areaLength: 12 }],
    });
    const kb = plan.phases[phaseOf(plan, 'keep-ball')].stations;
    expect(kb.every((s) => Math.min(s.area.width, s.area.length) === 10)).toBe(true);
    expect(plan.trace.find((t) => t.ruleId === 'feedback.keep-ball.too-easy')?.fired).toBe(true);
    expect(plan.trace.find((t) => t.ruleId === 'engine.feedback-start')?.effect).toContain('10 m');
  });

  it('too hard last time starts one step larger', async () => {
    const plan = await generatePlan({
      ...base,
      recentFeedback: [{ activityKind: 'keep-ball', verdict: 'too-hard', areaWidth: 10 }],
    });
    expect(
      plan.phases[phaseOf(plan, 'keep-ball')].stations.every(
        (s) => Math.min(s.area.width, s.area.length) === 12,
      ),
    ).toBe(true);
  });

  it('sizes the area to the new group: right at 10 m for 4 is about 11 m for 5 and 12 m for 6', async () => {
    // Area in proportion to players (the table's own square-root law): 10 × √(5/4) = 11.2 → 11 m,
    // 10 × √(6/4) = 12.2 → 12 m. The brief: "Size the area to the group".
    const plan = await generatePlan({
      ...base,
      recentFeedback: [
        { activityKind: 'keep-ball', verdict: 'right', areaWidth: 10, areaLength: 10, groupSize: 4 },
      ],
    });
    const kb = plan.phases[phaseOf(plan, 'keep-ball')].stations;
    expect(kb.length).toBeGreaterThan(0);
    for (const s of kb) {
      const group = s.playerIds.length + s.coachJoins;
      expect(Math.min(s.area.width, s.area.length)).toBe(Math.round(10 * Math.sqrt(group / 4)));
    }
    expect(plan.trace.find((t) => t.ruleId === 'engine.feedback-start')?.effect).toContain(
      'for a group of 4',
    );
  });
});

describe('listActivities', () => {
  it('marks movement preparation as not for U10, with the reason, and gives every option its one-line summary', async () => {
    const plan = await generatePlan(base);
    const options = listActivities(undefined, plan);
    const mp = options.find((o) => o.kind === 'movement-prep')!;
    expect(mp.allowed).toBe(false);
    expect(mp.reason).toMatch(/12 and under|U10/);
    expect(options.filter((o) => o.allowed).map((o) => o.kind)).toContain('keep-ball');
    for (const o of options) expect(o.summary.length).toBeGreaterThan(10);
  });

  it('without context lists all (but retired ones) as allowed', () => {
    const doc = structuredClone(defaultRuleSet);
    doc.parameters.activities[0].retired = true;
    const options = listActivities(doc);
    expect(options.every((o) => o.allowed)).toBe(true);
    expect(options.map((o) => o.id)).not.toContain(doc.parameters.activities[0].id);
  });
});
