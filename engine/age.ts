/** Age-group lookups from the rule set's table. */
import type { AgeBand, AgeGroup, RuleParameters } from '../shared/types';

export function ageIndex(params: RuleParameters, age: AgeGroup): number {
  return params.ageGroups[age].index;
}

export function ageBand(params: RuleParameters, age: AgeGroup): AgeBand {
  return params.ageGroups[age].band;
}
