import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

const activityIdsOf = (plan: SessionPlanDto) =>
  plan.plan.phases.flatMap((phase) => phase.stations.map((station) => station.activityId));

/** Each activity once, at its first place. */
const once = (ids: string[]) => [...new Set(ids)];

describe('variety: a new plan hears what the team played lately', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let first: SessionPlanDto;
  let second: SessionPlanDto;
  let third: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Hollins Vale Youth');
    squad = await createSquad(app, club.coach.token, 14, 'U12 Swallows');
    // The same request and seed every time, so only the team's history differs between them.
    const request = { ageGroup: 'U12' as const, minutes: 60, kind: 'training' as const };
    first = await createPlan(app, club.coach.token, squad, { date: '2026-11-03', request });
    second = await createPlan(app, club.coach.token, squad, { date: '2026-11-10', request });
    third = await createPlan(app, club.coach.token, squad, { date: '2026-11-17', request });
  });
  afterAll(() => app.close());

  it('the first plan has no history to hear', () => {
    expect(first.request.recentActivityIds).toBeUndefined();
  });

  it('lists the last plans’ activities newest plan first, each once, without drinks breaks', () => {
    expect(second.request.recentActivityIds).toEqual(once(activityIdsOf(first)));
    const expected = once([...activityIdsOf(second), ...activityIdsOf(first)]).filter(
      (id) => id !== 'drinks-break',
    );
    expect(third.request.recentActivityIds).toEqual(expected);
    expect(third.request.recentActivityIds).not.toContain('drinks-break');
    // Drinks breaks are phases of their own in an hour's training, never stations.
    expect(third.plan.phases.some((p) => p.activityKind === 'break')).toBe(true);
  });

  it('the plans that heard their history repeat fewer of its activities (engine: others where they fit)', () => {
    const repeatsOf = (plan: SessionPlanDto, recent: string[]) =>
      once(activityIdsOf(plan)).filter((id) => recent.includes(id)).length;
    const recent = third.request.recentActivityIds!;
    // The first plan is what this request gives with no history at all.
    expect(repeatsOf(third, recent)).toBeLessThan(repeatsOf(first, recent));
    const firstIds = once(activityIdsOf(first));
    expect(repeatsOf(second, firstIds)).toBeLessThan(firstIds.length);
  });

  it('keeps a request’s own list, and looks at the last three plans only', async () => {
    const own = await createPlan(app, club.coach.token, squad, {
      date: '2026-11-24',
      request: { ageGroup: 'U12', minutes: 60, kind: 'training', recentActivityIds: ['not-lately'] },
    });
    expect(own.request.recentActivityIds).toEqual(['not-lately']);
    const next = await createPlan(app, club.coach.token, squad, {
      date: '2026-12-01',
      request: { ageGroup: 'U12', minutes: 60, kind: 'training' },
    });
    const lastThree = once([...activityIdsOf(own), ...activityIdsOf(third), ...activityIdsOf(second)]);
    expect(next.request.recentActivityIds).toEqual(lastThree);
  });
});
