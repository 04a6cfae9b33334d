import type { Plan, PlanRequest } from '../../../../../shared/types';

type Generate = (request: PlanRequest, ruleSet?: never) => Promise<Plan>;
let engine: Promise<Generate> | null = null;

/** Runs the engine in the browser (loaded on first use) with a given rule-set document. */
export async function runPlan(request: PlanRequest, ruleSet: unknown): Promise<Plan> {
  engine ??= import('../../../../../engine/index').then((m) => m.generatePlan as unknown as Generate);
  const generate = await engine;
  return generate(request, (ruleSet ?? undefined) as never);
}
