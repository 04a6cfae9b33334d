/**
 * The client's one way into the engine (engine/index.ts): binds it to what the plan page and
 * pitch-side need, loaded lazily by BrowserEngine, and hands the screens that carry the engine in
 * their own lazy chunk (the library) the calls they make as they draw.
 */
import {
  areaLimits,
  checkPlan,
  leftEarlyIds,
  listActivities,
  progressionOutcome,
  replan,
  tryEdit,
} from '../../../../engine/index';
import type { BrowserEngineApi } from './browser-engine';

export {
  isFirstFormat,
  listActivities,
  previewActivity,
  suitsAge,
  upgradeRuleSet,
  type ActivityPreview,
} from '../../../../engine/index';

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
