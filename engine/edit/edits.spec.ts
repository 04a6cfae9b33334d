/** Coach edits, pitch-side progressions and the re-check of edited plans. */
import { describe, expect, it } from 'vitest';
import type { Plan, PlanRequest } from '../../shared/types';
import { applyEdit, applyProgression, checkPlan, generatePlan, listActivities } from '../index';

const base: PlanRequest = {
  ageGroup: 'U10',
  level: 'beginner',
  players: Array.from({ length: 11 }, (_, i) => ({ id: `p${i + 1}`, name: `Player ${i + 1}` })),
  coaches: 0,
  equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
  space: { width: 60, length: 40 },
  minutes: 15,
  kind: 'match-warm-up',
  seed: 'edits',
};

const keepBallPhase = (plan: Plan) =>
  plan.phases.findIndex((p) => p.stations.some((s) => s.activityKind === 'keep-ball'));
const codes = (notices: { code: string }[]) => notices.map((n) => n.code);

describe('checkPlan', () => {
  it('finds nothing wrong with a fresh plan', async () => {
    expect(checkPlan(await generatePlan(base))).toEqual([]);
  });

  it('names a player in two stations, a missing player, overlap, kit over the bag and a forbidden activity', async () => {
    const plan = structuredClone(await generatePlan(base));
    const [a, b] = plan.phases[0].stations;
    b.playerIds.push(a.playerIds[0]);
    plan.phases[1].stations[0].playerIds.pop();
    plan.phases[1].stations[1].position = { ...plan.phases[1].stations[0].position };
    plan.phases[2].stations[0].equipment.balls = 99;
    plan.phases[0].stations[0].activityKind = 'movement-prep';
    const found = codes(checkPlan(plan));
    expect(found).toEqual(
      expect.arrayContaining([
        'player-twice',
        'player-missing',
        'stations-overlap',
        'kit-over',
        'activity-not-for-age',
      ]),
    );
  });

  it('flags a keep-ball square with too many attackers per defender (5v1)', async () => {
    const plan = structuredClone(await generatePlan(base));
    const kb = plan.phases[keepBallPhase(plan)].stations.find((s) => s.roles.defenders?.length === 1)!;
    kb.roles.attackers!.push('extra');
    kb.playerIds.push('extra');
    const notice = checkPlan(plan).find((n) => n.code === 'keep-ball-ratio');
    expect(notice?.message).toContain('5v1');
  });

  it('flags a station outside the space', async () => {
    const plan = structuredClone(await generatePlan(base));
    plan.phases[0].stations[0].position = { x: 55, y: 0 };
    expect(codes(checkPlan(plan))).toContain('station-outside-space');
  });
});

describe('applyEdit', () => {
  it('moves a player and re-assigns keep-ball roles; a 4v1 that grows to 6 becomes 4v2', async () => {
    const plan = await generatePlan(base);
    const pi = keepBallPhase(plan);
    const [big, small] = plan.phases[pi].stations; // 4v2 and 4v1 (see the worked examples)
    const mover = big.roles.attackers![0];
    const edited = await applyEdit(plan, {
      type: 'move-player',
      playerId: mover,
      toStationId: small.id,
      phaseIndex: pi,
    });
    const after = edited.phases[pi].stations;
    expect(after.find((s) => s.id === big.id)!.playerIds).not.toContain(mover);
    const grown = after.find((s) => s.id === small.id)!;
    expect(grown.playerIds).toContain(mover);
    expect([grown.roles.attackers?.length, grown.roles.defenders?.length]).toEqual([4, 2]);
    expect(edited.trace.at(-1)).toMatchObject({ ruleId: 'edit.move-player', fired: true });
    expect(checkPlan(edited)).toEqual([]);
  });

  it('resizes a keep-ball area one step smaller (harder) within the rule bounds', async () => {
    const plan = await generatePlan(base);
    const pi = keepBallPhase(plan);
    const st = plan.phases[pi].stations[0];
    const edited = await applyEdit(plan, {
      type: 'resize-area',
      stationId: st.id,
      phaseIndex: pi,
      step: 'smaller',
    });
    const now = edited.phases[pi].stations.find((s) => s.id === st.id)!;
    expect(now.area.width).toBe(st.area.width - 2); // keep-ball step is 2 m
    expect(checkPlan(edited)).toEqual([]);
  });

  it('swaps a phase to another allowed activity and refuses a forbidden one', async () => {
    const plan = await generatePlan(base);
    const swapped = await applyEdit(plan, {
      type: 'swap-activity',
      phaseIndex: 0,
      activityId: 'pr-gate-passing',
    });
    expect(swapped.phases[0].activityId).toBe('pr-gate-passing');
    expect(
      swapped.phases[0].stations.every((s) => s.activityKind === 'pairs' || s.playerIds.length > 0),
    ).toBe(true);
    expect(checkPlan(swapped)).toEqual([]);
    const refused = await applyEdit(plan, {
      type: 'swap-activity',
      phaseIndex: 0,
      activityId: 'mp-lane-moves',
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
    const pi = keepBallPhase(plan);
    const st = plan.phases[pi].stations[1];
    const harder = applyProgression(plan, pi, st.id, 'too-easy');
    expect(harder.phases[pi].stations[1].area.width).toBe(st.area.width - 2);
    expect(harder.trace.at(-1)?.effect).toContain(`${st.area.width} m → ${st.area.width - 2} m`);
    const easier = applyProgression(plan, pi, st.id, 'too-hard');
    expect(easier.phases[pi].stations[1].area.width).toBe(st.area.width + 2);
  });

  it('too easy in passing-finishing makes the area larger (longer passes and shots)', async () => {
    const plan = await generatePlan(base);
    const st = plan.phases[1].stations[0];
    const harder = applyProgression(plan, 1, st.id, 'too-easy');
    expect(
      Math.min(harder.phases[1].stations[0].area.width, harder.phases[1].stations[0].area.length),
    ).toBeGreaterThan(Math.min(st.area.width, st.area.length));
  });

  it('stops at the rule minimum', async () => {
    let plan = await generatePlan(base);
    const pi = keepBallPhase(plan);
    const id = plan.phases[pi].stations[0].id;
    for (let i = 0; i < 10; i++) plan = applyProgression(plan, pi, id, 'too-easy');
    expect(plan.phases[pi].stations[0].area.width).toBe(6); // keep-ball minWidth
    expect(plan.trace.at(-1)).toMatchObject({ fired: false });
  });
});

describe('recent feedback', () => {
  it('keep-ball that was too easy at 10 m starts at 8 m next time, and the trace says why', async () => {
    const plan = await generatePlan({
      ...base,
      recentFeedback: [{ activityKind: 'keep-ball', verdict: 'too-easy', areaWidth: 10, areaLength: 10 }],
    });
    const kb = plan.phases[keepBallPhase(plan)].stations;
    expect(kb.every((s) => s.area.width === 8)).toBe(true);
    expect(plan.trace.find((t) => t.ruleId === 'feedback.keep-ball.too-easy')?.fired).toBe(true);
    expect(plan.trace.find((t) => t.ruleId === 'engine.feedback-start')?.effect).toContain('8 m');
  });

  it('too hard last time starts one step larger', async () => {
    const plan = await generatePlan({
      ...base,
      recentFeedback: [{ activityKind: 'keep-ball', verdict: 'too-hard', areaWidth: 10 }],
    });
    expect(plan.phases[keepBallPhase(plan)].stations.every((s) => s.area.width === 12)).toBe(true);
  });

  it('sizes the area to the new group: right at 10 m for 4 is about 11 m for 5 and 12 m for 6', async () => {
    // Area in proportion to players (the table's own square-root law): 10 × √(5/4) = 11.2 → 11 m,
    // 10 × √(6/4) = 12.2 → 12 m. The brief: "Size the area to the group". 11 players: 6 and 5.
    const plan = await generatePlan({
      ...base,
      recentFeedback: [
        { activityKind: 'keep-ball', verdict: 'right', areaWidth: 10, areaLength: 10, groupSize: 4 },
      ],
    });
    const kb = plan.phases[keepBallPhase(plan)].stations;
    expect(kb.length).toBeGreaterThan(0);
    for (const s of kb) {
      const group = s.playerIds.length + s.coachJoins;
      expect(s.area.width).toBe({ 5: 11, 6: 12 }[group]);
    }
    expect(plan.trace.find((t) => t.ruleId === 'engine.feedback-start')?.effect).toContain(
      'for a group of 4',
    );
  });
});

describe('listActivities', () => {
  it('lists every activity, marking movement preparation as not for U10 with the reason', async () => {
    const plan = await generatePlan(base);
    const options = listActivities(undefined, plan);
    const mp = options.find((o) => o.kind === 'movement-prep')!;
    expect(mp.allowed).toBe(false);
    expect(mp.reason).toMatch(/12 and under|U10/);
    expect(options.filter((o) => o.allowed).map((o) => o.kind)).toContain('keep-ball');
  });

  it('without context lists all as allowed', () => {
    expect(listActivities().every((o) => o.allowed)).toBe(true);
  });
});
