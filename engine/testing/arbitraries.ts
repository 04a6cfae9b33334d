/** fast-check generators of valid plan requests for the engine's property tests. */
import fc from 'fast-check';
import {
  ACTIVITY_KINDS,
  AGE_GROUPS,
  FOCUSES,
  LEVELS,
  PLAN_KINDS,
  type PlanRequest,
} from '../../shared/types';

export function requestArb(
  options: { minPlayers?: number; maxPlayers?: number } = {},
): fc.Arbitrary<PlanRequest> {
  const { minPlayers = 1, maxPlayers = 60 } = options;
  return fc
    .record({
      ageGroup: fc.constantFrom(...AGE_GROUPS),
      level: fc.constantFrom(...LEVELS),
      count: fc.integer({ min: minPlayers, max: maxPlayers }),
      keepers: fc.integer({ min: 0, max: 3 }),
      coaches: fc.integer({ min: 0, max: 3 }),
      equipment: fc.record({
        balls: fc.integer({ min: 0, max: 70 }),
        cones: fc.integer({ min: 0, max: 100 }),
        bibs: fc.integer({ min: 0, max: 30 }),
        goals: fc.integer({ min: 0, max: 8 }),
      }),
      space: fc.record({ width: fc.integer({ min: 4, max: 110 }), length: fc.integer({ min: 4, max: 110 }) }),
      minutes: fc.integer({ min: 5, max: 120 }),
      kind: fc.constantFrom(...PLAN_KINDS),
      focus: fc.option(fc.subarray([...FOCUSES], { minLength: 1 }), { nil: undefined }),
      temperatureC: fc.option(fc.integer({ min: -5, max: 40 }), { nil: undefined }),
      feedback: fc.option(
        fc.array(
          fc.record({
            activityKind: fc.constantFrom(...ACTIVITY_KINDS),
            verdict: fc.constantFrom('too-easy' as const, 'right' as const, 'too-hard' as const),
          }),
          { maxLength: 3 },
        ),
        { nil: undefined },
      ),
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
      return request;
    });
}
