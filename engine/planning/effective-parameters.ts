/** The parameters a request plans with, after the club rules: the derivations the tables imply. */
import type { PlanRequest, RuleParameters } from '../../shared/types';

/**
 * From `keepBallLimits.twoDefendersFromAge` every level plays the advanced two-defender
 * formats (5v2, 6v2), as the club's tables say for older and advanced groups.
 */
export function effectiveParameters(
  params: RuleParameters,
  request: Pick<PlanRequest, 'ageGroup'>,
): RuleParameters {
  const age = params.ageGroups[request.ageGroup].index;
  if (age < params.keepBallLimits.twoDefendersFromAge) return params;
  const advanced = params.keepBall.advanced;
  if (params.keepBall.beginner === advanced && params.keepBall.intermediate === advanced) return params;
  return { ...params, keepBall: { beginner: advanced, intermediate: advanced, advanced } };
}
