/** The activities of a rule set for the swap menu and the library, each usable for the request or not, and why. */
import type { AgeGroup, Level, Plan, PlanRequest, RuleSetDocument, StationKind } from '../shared/types';
import { compileRuleSet } from './club-rules/compile-rule-set';
import { effectiveParameters } from './planning/effective-parameters';
import { whyUnusable } from './planning/usable';
import { defaultRuleSet } from './rule-sets';

export interface ActivityOption {
  id: string;
  kind: StationKind;
  title: string;
  /** One line for menus. */
  summary: string;
  ages: { from: AgeGroup; to: AgeGroup };
  levels: Level[];
  allowed: boolean;
  reason?: string;
}

/**
 * With a Plan, the club rules that fired for it are applied; with a bare request, the age table,
 * numbers and kit only (rules need an async run — generatePlan does that). Retired activities
 * are left out.
 */
export function listActivities(
  ruleSet: RuleSetDocument = defaultRuleSet,
  context?: Plan | PlanRequest,
): ActivityOption[] {
  const base = compileRuleSet(ruleSet).document.parameters;
  const plan = context && 'phases' in context ? context : undefined;
  const request = plan ? plan.request : (context as PlanRequest | undefined);
  const params = request ? effectiveParameters(base, request) : base;
  const forbidden = plan?.forbiddenActivities ?? [];
  const band = request ? params.ageGroups[request.ageGroup].band : undefined;
  return params.activities
    .filter((a) => !a.retired)
    .map((a) => {
      const option: ActivityOption = {
        id: a.id,
        kind: a.kind,
        title: a.title,
        summary: a.summary,
        ages: a.ages,
        levels: a.levels,
        allowed: true,
      };
      if (!request || !band) return option;
      const reason = whyUnusable({ params, request, forbidden, band }, a);
      if (reason) {
        option.allowed = false;
        option.reason = reason;
      }
      return option;
    });
}
