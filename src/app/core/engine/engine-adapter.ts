/** Binds the engine (loaded lazily by BrowserEngine) to what the plan page and pitch-side need. */
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
