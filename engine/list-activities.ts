/** The activities of a rule set for the swap menu, each allowed for the request or not, and why. */
import type { ActivityKind, Plan, PlanRequest, RuleSetDocument } from '../shared/types';
import { activityBlocked } from './build/activities';
import { kindFeasible, type AllocationRules } from './build/allocation';
import { defaultRuleSet } from './rule-sets';
import { compileRuleSet } from './rules/compile-rule-set';

export interface ActivityOption {
  id: string;
  kind: ActivityKind;
  title: string;
  allowed: boolean;
  reason?: string;
}

/**
 * With a Plan, the club rules that fired for it are applied; with a bare request, the age table
 * and numbers and kit only (rules need an async run — generatePlan does that).
 */
export function listActivities(
  ruleSet: RuleSetDocument = defaultRuleSet,
  context?: Plan | PlanRequest,
): ActivityOption[] {
  const params = compileRuleSet(ruleSet).document.parameters;
  const plan = context && 'phases' in context ? context : undefined;
  const request = plan ? plan.request : (context as PlanRequest | undefined);
  const forbidden = plan?.forbiddenActivities ?? [];
  return params.activities.map((a) => {
    const option: ActivityOption = { id: a.id, kind: a.kind, title: a.title, allowed: true };
    if (!request) return option;
    const blocked = activityBlocked(params, request.ageGroup, forbidden, a);
    const rules: AllocationRules = {
      params,
      level: request.level,
      kit: request.equipment,
      usable: () => true,
    };
    const reason =
      blocked ??
      (kindFeasible(request.players.length, request.coaches, a.kind, rules)
        ? null
        : 'too few players or not enough kit for it');
    if (reason) {
      option.allowed = false;
      option.reason = reason;
    }
    return option;
  });
}
