/** fast-check generators of valid plan requests for the engine's property tests. */
import fc from 'fast-check';
import { AGE_GROUPS, FOCUSES, LEVELS, PLAN_KINDS, STATION_KINDS, type PlanRequest } from '../../shared/types';
import { defaultRuleSet } from '../rule-sets';

const ACTIVITY_IDS = defaultRuleSet.parameters.activities.map((a) => a.id);

export interface RequestOptions {
  minPlayers?: number;
  maxPlayers?: number;
  /** Everyday requests: a squad, a pitch and kit a club would bring, not the extremes. */
  everyday?: boolean;
}

export function requestArb(options: RequestOptions = {}): fc.Arbitrary<PlanRequest> {
  const { minPlayers = 1, maxPlayers = 60, everyday = false } = options;
  const kit = everyday
    ? fc.record({
        balls: fc.integer({ min: 4, max: 30 }),
        cones: fc.integer({ min: 20, max: 80 }),
        bibs: fc.integer({ min: 6, max: 24 }),
        goals: fc.integer({ min: 0, max: 4 }),
      })
    : fc.record({
        balls: fc.integer({ min: 0, max: 70 }),
        cones: fc.integer({ min: 0, max: 100 }),
        bibs: fc.integer({ min: 0, max: 30 }),
        goals: fc.integer({ min: 0, max: 8 }),
      });
  const space = everyday
    ? fc.record({ width: fc.integer({ min: 25, max: 70 }), length: fc.integer({ min: 30, max: 100 }) })
    : fc.record({ width: fc.integer({ min: 4, max: 110 }), length: fc.integer({ min: 4, max: 110 }) });
  return fc
    .record({
      ageGroup: fc.constantFrom(...AGE_GROUPS),
      level: fc.constantFrom(...LEVELS),
      count: fc.integer({ min: minPlayers, max: maxPlayers }),
      keepers: fc.integer({ min: 0, max: 3 }),
      coaches: fc.integer({ min: 0, max: 4 }),
      equipment: kit,
      space,
      minutes: everyday ? fc.integer({ min: 15, max: 90 }) : fc.integer({ min: 5, max: 120 }),
      kind: fc.constantFrom(...PLAN_KINDS),
      focus: fc.option(fc.subarray([...FOCUSES], { minLength: 1, maxLength: 3 }), { nil: undefined }),
      temperatureC: fc.option(fc.integer({ min: -5, max: 40 }), { nil: undefined }),
      feedback: fc.option(
        fc.array(
          fc.record({
            activityKind: fc.constantFrom(...STATION_KINDS),
            verdict: fc.constantFrom('too-easy' as const, 'right' as const, 'too-hard' as const),
          }),
          { maxLength: 3 },
        ),
        { nil: undefined },
      ),
      recent: fc.option(fc.subarray(ACTIVITY_IDS, { maxLength: 10 }), { nil: undefined }),
      pinned: fc.option(fc.subarray(ACTIVITY_IDS, { minLength: 1, maxLength: 2 }), { nil: undefined }),
      seed: fc.string({ minLength: 1, maxLength: 12 }),
    })
    .map((r) => {
      const request: PlanRequest = {
        ageGroup: r.ageGroup,
        level: r.level,
        players: Array.from({ length: r.count }, (_, i) => ({
          id: `p${i + 1}`,
          goalkeeper: i < r.keepers || undefined,
        })),
        coaches: r.coaches,
        equipment: r.equipment,
        space: r.space,
        minutes: r.minutes,
        kind: r.kind,
        seed: r.seed,
      };
      for (const p of request.players) if (!p.goalkeeper) delete p.goalkeeper;
      if (r.focus) request.focus = r.focus;
      if (r.temperatureC !== undefined) request.conditions = { temperatureC: r.temperatureC };
      if (r.feedback) request.recentFeedback = r.feedback;
      if (r.recent) request.recentActivityIds = r.recent;
      if (r.pinned) request.pinnedActivityIds = r.pinned;
      return request;
    });
}
