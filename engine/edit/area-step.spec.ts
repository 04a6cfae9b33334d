/** An area step's limits: the edit, pitch-side and the plan page's buttons give one answer, in plain words. */
import { describe, expect, it } from 'vitest';
import type { Plan, PlanRequest } from '../../shared/types';
import { areaLimits, generatePlan, progressionOutcome, tryEdit } from '../index';

const base: PlanRequest = {
  ageGroup: 'U10',
  level: 'beginner',
  players: Array.from({ length: 11 }, (_, i) => ({ id: `p${i + 1}`, name: `Player ${i + 1}` })),
  coaches: 1,
  equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
  space: { width: 30, length: 40 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'area-step',
};

const keepBall = (plan: Plan) => plan.phases.findIndex((p) => p.activityKind === 'keep-ball');
// Words a coach should never read: station ids, rule ids, level codes.
const CODE_LIKE = /p\d+-s\d+|\bs\d+\b|progression\.|beginner|keep-ball/;

describe('area steps', () => {
  it('steps larger until the limit, then refuses with the reason the buttons show', async () => {
    let plan = await generatePlan(base);
    const pi = keepBall(plan);
    const id = plan.phases[pi].stations[0].id;
    expect(areaLimits(plan)[`${pi}:${id}`].larger).toBeNull();
    let refused: string | null = null;
    for (let i = 0; i < 40 && !refused; i++) {
      const out = await tryEdit(plan, { type: 'resize-area', phaseIndex: pi, stationId: id, step: 'larger' });
      refused = out.refused;
      if (!refused) {
        expect(out.plan.phases[pi]).not.toEqual(plan.phases[pi]);
        plan = out.plan;
      } else {
        expect(out.plan.phases).toEqual(plan.phases);
      }
    }
    expect(refused).toMatch(/^(Largest area for this space|Largest area the club's rules allow|No room)/);
    expect(refused).not.toMatch(CODE_LIKE);
    expect(areaLimits(plan)[`${pi}:${id}`].larger).toBe(refused);
    expect(areaLimits(plan)[`${pi}:${id}`].smaller).toBeNull();
  });

  it('names the smallest area the rules allow, and pitch-side gets the same words', async () => {
    let plan = await generatePlan(base);
    const pi = keepBall(plan);
    const id = plan.phases[pi].stations[0].id;
    let limit: string | null = null;
    for (let i = 0; i < 40 && !limit; i++) {
      const out = await tryEdit(plan, {
        type: 'resize-area',
        phaseIndex: pi,
        stationId: id,
        step: 'smaller',
      });
      limit = out.refused;
      plan = out.plan;
    }
    const area = plan.phases[pi].stations.find((s) => s.id === id)!.area;
    expect(limit).toBe(
      `Smallest area the club's rules allow for this group: ${area.width} × ${area.length} m.`,
    );
    // Keep-ball is harder when smaller: "too easy" asks for the same step and is refused alike.
    expect(progressionOutcome(plan, pi, id, 'too-easy').refused).toBe(limit);
    expect(areaLimits(plan)[`${pi}:${id}`].smaller).toBe(limit);
  });

  it('refuses a swap in plain words and changes nothing', async () => {
    const plan = await generatePlan(base);
    const pi = plan.phases.findIndex((p) => p.activityKind === 'passing-pattern');
    const out = await tryEdit(plan, {
      type: 'swap-activity',
      phaseIndex: pi,
      activityId: 'mp-lunge-twist-go',
    });
    expect(out.refused).toMatch(/cannot be used here/);
    expect(out.refused).not.toMatch(CODE_LIKE);
    expect(out.plan.phases).toEqual(plan.phases);
  });
});
