/** Feedback follows its station: a verdict steers the activity it was given on, and no other. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { FeedbackFact, Plan, PlanRequest } from '../../shared/types';
import { defaultRuleSet, generatePlan } from '../index';
import { requestArb } from '../testing/arbitraries';

const base: PlanRequest = {
  ageGroup: 'U11',
  level: 'intermediate',
  players: Array.from({ length: 11 }, (_, i) => ({ id: `p${i + 1}`, name: `Player ${i + 1}` })),
  coaches: 0,
  equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
  space: { width: 60, length: 40 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'station-feedback',
};

const stationsOf = (plan: Plan, activityId: string) =>
  plan.phases.flatMap((p) => p.stations).filter((s) => s.activityId === activityId);
const side = (s: { area: { width: number; length: number } }) => Math.min(s.area.width, s.area.length);
const sentences = (plan: Plan) =>
  plan.trace.filter((t) => t.ruleId === 'engine.feedback-start').map((t) => t.description ?? '');

// Two keep-ball activities of the library (invented titles in rules/default-rule-set.json).
const JUDGED = 'kb-through-the-middle';
const OTHER = 'kb-ten-or-break-out';
const tooEasy: FeedbackFact = {
  activityKind: 'keep-ball',
  activityId: JUDGED,
  verdict: 'too-easy',
  areaWidth: 12,
  areaLength: 12,
  groupSize: 5,
};

describe('station feedback', () => {
  it('a verdict on one keep-ball activity leaves another keep-ball activity as it would be', async () => {
    const pinned = { ...base, pinnedActivityIds: [OTHER] };
    const without = await generatePlan(pinned);
    const withVerdict = await generatePlan({ ...pinned, recentFeedback: [tooEasy] });
    const before = stationsOf(without, OTHER);
    expect(before.length, 'the pinned activity is played').toBeGreaterThan(0);
    expect(stationsOf(withVerdict, OTHER).map((s) => s.area)).toEqual(before.map((s) => s.area));
    expect(stationsOf(withVerdict, JUDGED)).toEqual([]);
    expect(sentences(withVerdict)).toEqual([]);
  });

  it('steers the judged activity: too easy at 12 m for 5 starts a step smaller, scaled to each group', async () => {
    const plan = await generatePlan({ ...base, pinnedActivityIds: [JUDGED], recentFeedback: [tooEasy] });
    const judged = stationsOf(plan, JUDGED);
    expect(judged.length).toBeGreaterThan(0);
    const step = defaultRuleSet.parameters.areas['keep-ball']['U11-U12'].step;
    for (const s of judged) {
      const group = s.playerIds.length + s.coachJoins;
      // One table step down from 12 m, then the square-root law for the new group (common practice).
      expect(side(s)).toBe(Math.round((12 - step) * Math.sqrt(group / 5)));
    }
    const percent = Math.round((1 - (12 - step) / 12) * 100);
    expect(sentences(plan)).toEqual([
      `Last time ‘Through the middle’ was marked too easy for groups of 5, so its area is ${percent}% smaller today, scaled to each group’s size.`,
    ]);
  });

  it('two activities of one kind judged differently each follow their own verdict', async () => {
    const tooHardOther: FeedbackFact = {
      activityKind: 'keep-ball',
      activityId: OTHER,
      verdict: 'too-hard',
      areaWidth: 12,
      areaLength: 12,
      groupSize: 5,
    };
    // Newest first: the judged activity's "too easy" is the kind's newest verdict.
    const plan = await generatePlan({
      ...base,
      pinnedActivityIds: [OTHER],
      recentFeedback: [tooEasy, tooHardOther],
    });
    const step = defaultRuleSet.parameters.areas['keep-ball']['U11-U12'].step;
    const other = stationsOf(plan, OTHER);
    expect(other.length).toBeGreaterThan(0);
    for (const s of other) {
      const group = s.playerIds.length + s.coachJoins;
      expect(side(s)).toBe(Math.round((12 + step) * Math.sqrt(group / 5)));
    }
    expect(sentences(plan)).toEqual([
      expect.stringMatching(
        /^Last time ‘Ten passes or break out’ was marked too hard for groups of 5, so its area is \d+% larger today/,
      ),
    ]);
  });

  it('property: a verdict on an activity the plan does not play changes none of its stations', async () => {
    const activities = defaultRuleSet.parameters.activities;
    await fc.assert(
      fc.asyncProperty(
        requestArb({ minPlayers: 4, maxPlayers: 20 }),
        fc.nat(),
        fc.constantFrom('too-easy', 'too-hard', 'right') as fc.Arbitrary<FeedbackFact['verdict']>,
        async (request, pick, verdict) => {
          const { recentFeedback: _none, ...plain } = request;
          const plan = await generatePlan(plain);
          const played = new Set(plan.phases.flatMap((p) => p.stations.map((s) => s.activityId)));
          const kinds = [...new Set(plan.phases.flatMap((p) => p.stations.map((s) => s.activityKind)))];
          const unplayed = activities.filter(
            (a) =>
              kinds.includes(a.kind as never) &&
              !played.has(a.id) &&
              plain.pinnedActivityIds?.includes(a.id) !== true,
          );
          fc.pre(unplayed.length > 0);
          const judged = unplayed[pick % unplayed.length]!;
          const again = await generatePlan({
            ...plain,
            recentFeedback: [
              {
                activityKind: judged.kind,
                activityId: judged.id,
                verdict,
                areaWidth: 9,
                areaLength: 9,
                groupSize: 3,
              },
            ],
          });
          expect(again.phases).toEqual(plan.phases);
        },
      ),
      { numRuns: 60 },
    );
  }, 120_000);
});
