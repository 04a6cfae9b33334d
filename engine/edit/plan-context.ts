/**
 * What an edit needs to rebuild one phase of an existing plan as the planner would: the build
 * context for the plan's request (club rules run again) and the phase's spec.
 */
import type { ActivityDefinition, Phase, Plan, PlanRequest, RuleSetDocument } from '../../shared/types';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { evaluateRules } from '../club-rules/evaluate-rules';
import { buildFacts } from '../club-rules/facts';
import { allocationRules, planContext } from '../generate-plan';
import type { AllocationRules } from '../planning/allocation';
import type { BuildContext } from '../planning/context';
import type { PhaseSpec } from '../planning/timing';

export interface EditContext {
  ctx: BuildContext;
  rules: AllocationRules;
}

/** The build context for `request` under the rule set, its randomness seeded by `seed`. */
export async function editContext(
  request: PlanRequest,
  ruleSet: RuleSetDocument,
  seed: string,
): Promise<EditContext> {
  const compiled = compileRuleSet(ruleSet);
  const outcome = await evaluateRules(compiled, buildFacts(request, compiled.document.parameters));
  const ctx = planContext(request, outcome, seed);
  return { ctx, rules: allocationRules(ctx) };
}

/** The spec that rebuilds a phase with the given activities to try, keeping its time and its keepers' role. */
export function specOf(plan: Plan, phaseIndex: number, candidates: ActivityDefinition[]): PhaseSpec {
  const phase = plan.phases[phaseIndex];
  const warmedBefore = plan.phases.slice(0, phaseIndex).some(hasKeeperWarmUp);
  return {
    name: phase.name,
    slot: (phase.slot as PhaseSpec['slot']) ?? 'technical',
    candidates,
    startMinute: phase.startMinute,
    endMinute: phase.endMinute,
    ...(hasKeeperWarmUp(phase) ? { keeperWarmUp: true } : {}),
    ...(warmedBefore ? { keepersInGoal: true } : {}),
  };
}

/** The last phase played before `phaseIndex` (its grids are the ones standing). */
export function lastPlayedBefore(plan: Plan, phaseIndex: number): Phase | undefined {
  for (let i = phaseIndex - 1; i >= 0; i--)
    if (plan.phases[i].activityKind !== 'break') return plan.phases[i];
  return undefined;
}

function hasKeeperWarmUp(phase: Phase): boolean {
  return phase.stations.some((s) => s.activityKind === 'goalkeeping');
}
