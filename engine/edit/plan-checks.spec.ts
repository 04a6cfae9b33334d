/** The re-check an edit keeps with its plan, and how the next edit drops it. */
import { describe, expect, it } from 'vitest';
import type { PlanRequest } from '../../shared/types';
import { checkPlan } from '../check-plan';
import { generatePlan } from '../generate-plan';
import { defaultRuleSet } from '../rule-sets';
import { isCheckNotice, withChecks } from './plan-checks';
import { refreshPlan } from './rebuild';

const request: PlanRequest = {
  ageGroup: 'U10',
  level: 'intermediate',
  players: Array.from({ length: 10 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 1,
  equipment: { balls: 12, cones: 40, bibs: 10, goals: 2 },
  space: { width: 40, length: 30 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'plan-checks',
};

describe('withChecks', () => {
  it('adds nothing to a plan the engine finds nothing wrong with', async () => {
    const plan = await generatePlan(request);
    expect(withChecks(plan, defaultRuleSet).warnings).toEqual(plan.warnings);
  });

  it('keeps each problem checkPlan finds as a check: warning with its words', async () => {
    const plan = structuredClone(await generatePlan(request));
    const [a, b] = plan.phases.find((p) => p.stations.length > 1)!.stations;
    b.playerIds.push(a.playerIds[0]);
    const found = checkPlan(plan, defaultRuleSet);
    const added = withChecks(plan, defaultRuleSet).warnings.slice(plan.warnings.length);
    expect(found.map((c) => c.code)).toContain('player-twice');
    expect(added).toEqual(found.map((c) => ({ ...c, code: `check:${c.code}` })));
    expect(added.every(isCheckNotice)).toBe(true);
    expect(plan.warnings.some(isCheckNotice)).toBe(false);
  });

  it('is dropped by the next refresh, which leaves the checking to its caller', async () => {
    const plan = await generatePlan(request);
    const stale = { ...plan, warnings: [...plan.warnings, { code: 'check:player-twice', message: 'old' }] };
    const refreshed = refreshPlan(stale, stale.phases, defaultRuleSet.parameters);
    expect(refreshed.warnings.some(isCheckNotice)).toBe(false);
  });
});
