/** Binds the engine (loaded lazily by BrowserEngine) to what the plan page needs. */
import { applyEdit, checkPlan, listActivities } from '../../../../engine/index';
import type { BrowserEngineApi } from './browser-engine';

export function createEngineAdapter(): BrowserEngineApi {
  return {
    applyEdit: async (plan, edit) => await applyEdit(plan, edit),
    checkPlan: (plan) => checkPlan(plan),
    activities: (plan) =>
      listActivities(undefined, plan)
        .filter((a) => a.allowed)
        .map((a) => ({ id: a.id, kind: a.kind, title: a.title })),
  };
}
