/**
 * The club rules screens' one doorway into engine/: the rule-set check, the library's set-ups and
 * previews, the squads "try it" runs and the outline it compares, plans made under a given rule set, and the one JSON diff.
 */
import {
  generatePlan,
  jsonDiff,
  ruleSetChanges,
  type JsonChange,
  type RuleSetDocument,
} from '../../../../../engine/index';
import type { Plan, PlanRequest } from '../../../../../shared/types';

export {
  defaultRuleSet,
  kindLayouts,
  outlineChanges,
  outlinePlan,
  previewActivity,
  sampleSquads,
  teamSquad,
  validateRuleSet,
  type ActivityPreview,
  type JsonChange,
  type PlanOutline,
  type RuleSetDocument,
  type SampleSquad,
} from '../../../../../engine/index';

/** Makes a plan with a given rule-set document (null: the engine's own rules). */
export function runPlan(request: PlanRequest, ruleSet: unknown): Promise<Plan> {
  return generatePlan(request, (ruleSet ?? undefined) as RuleSetDocument | undefined);
}

/**
 * What a lead changed in the editor, a change a place: a list typed into one cell is one change,
 * so "4v1, 3v1" → "3v1" counts once and is re-applied whole after a conflict.
 */
export function editedChanges(before: unknown, after: unknown): JsonChange[] {
  return jsonDiff(before, after, 'values');
}

/** What differs between two versions of the rules, as the history's compare table lists it. */
export function versionChanges(before: unknown, after: unknown): JsonChange[] {
  return ruleSetChanges(before, after, 'values');
}
