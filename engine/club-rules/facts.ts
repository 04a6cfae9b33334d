/** The facts club rules can test, built from a request and the rule set's thresholds. */
import type { PlanRequest, RuleParameters } from '../../shared/types';

export type Facts = Record<string, unknown>;

export function buildFacts(request: PlanRequest, params: RuleParameters): Facts {
  const facts: Facts = {
    ageIndex: params.ageGroups[request.ageGroup].index,
    ageGroup: request.ageGroup,
    level: request.level,
    playerCount: request.players.length,
    goalkeeperCount: request.players.filter((p) => p.goalkeeper).length,
    coaches: request.coaches,
    balls: request.equipment.balls,
    cones: request.equipment.cones,
    bibs: request.equipment.bibs,
    goals: request.equipment.goals,
    spaceWidth: request.space.width,
    spaceLength: request.space.length,
    spaceArea: request.space.width * request.space.length,
    minutes: request.minutes,
    kind: request.kind,
    focus: request.focus ?? [],
    temperatureC: request.conditions?.temperatureC,
    heatThresholdC: params.cautions.heatC,
    coldThresholdC: params.cautions.coldC,
  };
  // Newest feedback per activity kind wins (the list is newest first).
  for (const fb of [...(request.recentFeedback ?? [])].reverse()) {
    facts[`feedback:${fb.activityKind}`] = fb.verdict;
  }
  return facts;
}
