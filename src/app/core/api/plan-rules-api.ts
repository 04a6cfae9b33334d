/**
 * The rule-set client's former name, kept for pitch-side.
 * TODO(boundaries): remove once pitch-side/club-rules move to core/api (RuleSetsApi).
 */
export { RuleSetsApi as PlanRulesApi } from './rule-sets-api';
