/** Pitch-side re-plan: as few moves as a fresh plan at most, and every invariant of a fresh plan. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Phase, Plan } from '../../shared/types';
import { checkPlan, defaultRuleSet, generatePlan, replan } from '../index';
import { requestArb } from '../testing/arbitraries';
import { brokenInvariants } from '../testing/plan-invariants';

/** Fewest players who must change station to turn `before` into `after` (best station matching). */
function minimalMoves(before: Phase, after: Phase, stay: Set<string>): number {
  const old = before.stations.map((s) => s.playerIds.filter((id) => stay.has(id)));
  const fresh = after.stations.map((s) => new Set(s.playerIds));
  const total = old.reduce((n, g) => n + g.length, 0);
  const overlap = old.map((g) => fresh.map((f) => g.filter((id) => f.has(id)).length));
  // Exact best matching by DP over subsets of the fresh stations (they are few in these tests).
  const m = fresh.length;
  let best = new Map<number, number>([[0, 0]]);
  for (const row of overlap) {
    const next = new Map(best);
    for (const [mask, value] of best) {
      for (let j = 0; j < m; j++) {
        if (mask & (1 << j)) continue;
        const key = mask | (1 << j);
        next.set(key, Math.max(next.get(key) ?? 0, value + row[j]));
      }
    }
    best = next;
  }
  return total - Math.max(...best.values());
}

function stationMoves(
  moves: { fromStationId: string | null; toStationId: string | null; phaseIndex: number }[],
  phase: number,
) {
  return moves.filter((m) => m.phaseIndex === phase && m.fromStationId !== null && m.toStationId !== null)
    .length;
}

describe('replan', () => {
  const change = fc.record({ arrive: fc.boolean(), pick: fc.nat(), at: fc.nat() });

  it('after one arrival or departure moves no more players than a fresh plan and keeps every invariant', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb({ minPlayers: 2, maxPlayers: 22 }), change, async (request, c) => {
        const plan = await generatePlan(request);
        const fromMinute = c.at % request.minutes;
        const leaving = plan.request.players[c.pick % plan.request.players.length].id;
        const roster = c.arrive
          ? { add: [{ id: 'late-1', name: 'Late arrival' }], fromMinute }
          : { remove: [leaving], fromMinute };
        const { plan: after, moves } = await replan(plan, roster);
        expect(brokenInvariants(after, defaultRuleSet, fromMinute)).toEqual([]);
        // Waiting beyond one is allowed only where the kit cannot do better and a warning says so.
        expect(checkPlan(after).filter((c) => c.code !== 'too-many-waiting')).toEqual([]);

        // Finished phases are left exactly as they ran.
        plan.phases.forEach((p, i) => {
          if (p.endMinute <= fromMinute) expect(after.phases[i]).toEqual(p);
        });

        const fresh = await generatePlan(after.request);
        const stay = new Set(after.request.players.map((p) => p.id));
        let ours = 0;
        let theirs = 0;
        plan.phases.forEach((p, i) => {
          if (p.endMinute <= fromMinute || !fresh.phases[i]) return;
          ours += stationMoves(moves, i);
          theirs += minimalMoves(p, fresh.phases[i], stay);
        });
        expect(ours).toBeLessThanOrEqual(theirs);
      }),
      { numRuns: 120 },
    );
  }, 120_000);

  it('moves nobody when an arrival fits an open place (worked example)', async () => {
    // 6 U9 beginners, one goalkeeper-less pass-and-finish phase: 3 + 3. A 7th player makes 4 + 3:
    // the two groups stay and only the newcomer is placed.
    const plan = await generatePlan({
      ageGroup: 'U9',
      level: 'beginner',
      players: Array.from({ length: 6 }, (_, i) => ({ id: `p${i + 1}` })),
      coaches: 0,
      equipment: { balls: 10, cones: 30, bibs: 6, goals: 2 },
      space: { width: 40, length: 40 },
      minutes: 15,
      kind: 'match-warm-up',
      seed: 'late-one',
    });
    const pf = plan.phases.findIndex((p) => p.stations.every((s) => s.activityKind === 'passing-finishing'));
    expect(pf).toBeGreaterThanOrEqual(0);
    expect(plan.phases[pf].stations.map((s) => s.playerIds.length)).toEqual([3, 3]);
    const { plan: after, moves } = await replan(plan, { add: [{ id: 'p7' }], fromMinute: 0 });
    expect(after.phases[pf].stations.map((s) => s.playerIds.length).sort()).toEqual([3, 4]);
    expect(moves.filter((m) => m.phaseIndex === pf)).toEqual([
      { playerId: 'p7', fromStationId: null, toStationId: expect.any(String), phaseIndex: pf },
    ]);
    for (const before of plan.phases[pf].stations) {
      const now = after.phases[pf].stations.find((s) => s.id === before.id)!;
      expect(now.playerIds.slice(0, before.playerIds.length)).toEqual(before.playerIds);
    }
  });

  it('records who leaves and keeps finished phases for the roster they ran with', async () => {
    const plan = await generatePlan({
      ageGroup: 'U12',
      level: 'intermediate',
      players: Array.from({ length: 10 }, (_, i) => ({ id: `p${i + 1}` })),
      coaches: 1,
      equipment: { balls: 12, cones: 40, bibs: 8, goals: 2 },
      space: { width: 50, length: 40 },
      minutes: 20,
      kind: 'match-warm-up',
      seed: 'early-leaver',
    });
    const fromMinute = plan.phases[0].endMinute;
    const { plan: after, moves } = await replan(plan, { remove: ['p4'], fromMinute });
    expect(after.phases[0]).toEqual(plan.phases[0]);
    const leaving = moves.filter((m) => m.playerId === 'p4');
    expect(leaving.length).toBe(plan.phases.length - 1);
    expect(leaving.every((m) => m.toStationId === null)).toBe(true);
    expect(after.rosterChanges).toEqual([{ fromMinute, added: [], removed: ['p4'] }]);
    expect(after.warnings.filter((w) => w.code.startsWith('check:'))).toEqual([]);
    expect(after.trace.at(-1)?.ruleId).toBe('engine.replan');
  });
});

export type { Plan };
