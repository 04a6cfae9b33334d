/** Binds the engine (loaded lazily by BrowserEngine) to what the plan page needs. */
import { areaLimits, checkPlan, listActivities, tryEdit } from '../../../../engine/index';
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
  };
}
