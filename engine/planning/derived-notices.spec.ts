/** The notices a plan's stations imply: the steps that write them write only listed codes. */
import { describe, expect, it } from 'vitest';
import type { Notice, PlanRequest } from '../../shared/types';
import { refreshPlan } from '../edit/rebuild';
import { generatePlan } from '../generate-plan';
import { defaultRuleSet } from '../rule-sets';
import { activityById } from './activities';
import { DERIVED_CODES, isDerivedNotice, type DerivedNotices } from './derived-notices';
import { equipPhase } from './kit';
import { markPhase } from './markings';
import { summarize } from './summary';

/** A cold U9 session short of balls, bibs and goals: kit notices have a reason to show. */
const request: PlanRequest = {
  ageGroup: 'U9',
  level: 'beginner',
  players: Array.from({ length: 16 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 2,
  equipment: { balls: 3, cones: 40, bibs: 2, goals: 0 },
  space: { width: 30, length: 25 },
  minutes: 60,
  kind: 'training',
  seed: 'derived-notices',
  conditions: { temperatureC: 1 },
};

describe('derived notices', () => {
  it('are all the kit, markings and summary steps write, and none of the others', async () => {
    const plan = await generatePlan(request);
    const params = defaultRuleSet.parameters;
    const written: Notice[] = [];
    for (const phase of plan.phases.filter((p) => p.activityKind !== 'break')) {
      const stations = phase.stations.map((s) => ({ ...s }));
      const activities = stations.map((s) => activityById(params, s.activityId)!);
      markPhase(stations, activities, params, request.equipment, written, phase.name, []);
      equipPhase(stations, activities, request.equipment, written, phase.name, true);
    }
    summarize(plan.phases, params, request.minutes, written);
    expect(written.map((w) => w.code)).toEqual(expect.arrayContaining(['bibs-short']));
    expect(written.every(isDerivedNotice)).toBe(true);
    const others = plan.warnings.filter((w) => !written.some((x) => x.code === w.code));
    expect(others.filter(isDerivedNotice)).toEqual([]);
  });

  it('are written again by an edit’s refresh, which keeps every other notice', async () => {
    const plan = await generatePlan(request);
    const club = { code: 'club-own-warning', message: 'Bring water.' };
    const stale = { code: DERIVED_CODES[0], message: 'From before the edit.' };
    const refreshed = refreshPlan(
      { ...plan, warnings: [...plan.warnings, club, stale] },
      plan.phases,
      defaultRuleSet.parameters,
    );
    expect(refreshed.warnings).toContainEqual(club);
    expect(refreshed.warnings).not.toContainEqual(stale);
    expect(refreshed.warnings.filter(isDerivedNotice).length).toBeGreaterThan(0);
  });

  it('cannot be written with a code outside the list', () => {
    const sink: DerivedNotices = [];
    // @ts-expect-error a code the refresh would not know to drop
    sink.push({ code: 'not-listed', message: '' });
    sink.push({ code: 'bibs-short', message: '' });
    expect(isDerivedNotice({ code: 'not-listed', message: '' })).toBe(false);
    expect(isDerivedNotice({ code: 'bibs-short', message: '' })).toBe(true);
  });
});
