/**
 * The client's one way into the engine (engine/index.ts). It binds the engine to what the plan page
 * and pitch-side need, loaded lazily by BrowserEngine, and hands the screens that carry the engine
 * in their own lazy chunk (the library, the club's rules) the calls they make as they draw: the
 * rule-set check, the library's set-ups and previews, the squads "try it" runs and the outline it
 * compares, plans made under a given rule set, and the one JSON diff.
 */
import {
  areaLimits,
  checkPlan,
  generatePlan,
  jsonDiff,
  leftEarlyIds,
  listActivities,
  progressionOutcome,
  replan,
  ruleSetChanges,
  tryEdit,
  type JsonChange,
  type RuleSetDocument,
} from '../../../../engine/index';
import type { Plan, PlanRequest } from '../../../../shared/types';
import type { BrowserEngineApi } from './browser-engine';

export {
  defaultRuleSet,
  isFirstFormat,
  kindLayouts,
  listActivities,
  outlineChanges,
  outlinePlan,
  previewActivity,
  sampleSquads,
  suitsAge,
  teamSquad,
  upgradeRuleSet,
  validateRuleSet,
  type ActivityPreview,
  type JsonChange,
  type PlanOutline,
  type RuleSetDocument,
  type SampleSquad,
} from '../../../../engine/index';

/** Makes a plan with a given rule-set document (null: the engine's own rules). */
export function runPlan(request: PlanRequest, ruleSet: unknown): Promise<Plan> {
  return generatePlan(request, (ruleSet ?? undefined) as RuleSetDocument | undefined);
}

/**
 * What a lead changed in the rules editor, a change a place: a list typed into one cell is one
 * change, so "4v1, 3v1" → "3v1" counts once and is re-applied whole after a conflict.
 */
export function editedChanges(before: unknown, after: unknown): JsonChange[] {
  return jsonDiff(before, after, 'values');
}

/** What differs between two versions of the rules, as the history's compare table lists it. */
export function versionChanges(before: unknown, after: unknown): JsonChange[] {
  return ruleSetChanges(before, after, 'values');
}

export function createEngineAdapter(): BrowserEngineApi {
  return {
    tryEdit: async (plan, edit, rules) => await tryEdit(plan, edit, rules ?? undefined),
    areaLimits: (plan, rules) => areaLimits(plan, rules ?? undefined),
    checkPlan: (plan, rules) => checkPlan(plan, rules ?? undefined),
    activities: (plan, rules) =>
      listActivities(rules ?? undefined, plan).map((a) => ({
        id: a.id,
        kind: a.kind,
        title: a.title,
        summary: a.summary,
        allowed: a.allowed,
        ...(a.reason ? { reason: a.reason } : {}),
      })),
    replan: (plan, change, rules) => replan(plan, change, rules ?? undefined),
    progression: (plan, phaseIndex, stationId, verdict, rules) =>
      progressionOutcome(plan, phaseIndex, stationId, verdict, rules ?? undefined),
    leftEarlyIds: (plan) => leftEarlyIds(plan),
  };
}
