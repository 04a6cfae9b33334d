/**
 * What an edit needs from an existing plan to rebuild one of its phases as the planner would:
 * the club rules run for the plan's request (once), the build context they give, the phase's
 * spec, and the phase rebuilt from the activities to try.
 */
import type {
  ActivityDefinition,
  Phase,
  Plan,
  PlanRequest,
  RuleSetDocument,
  Station,
} from '../../shared/types';
import { compileRuleSet, type CompiledRuleSet } from '../club-rules/compile-rule-set';
import { evaluateRules, type RuleOutcome } from '../club-rules/evaluate-rules';
import { buildFacts, type Facts } from '../club-rules/facts';
import { allocationRules, planContext } from '../generate-plan';
import type { AllocationRules } from '../planning/allocation';
import { buildPhase } from '../planning/build-phase';
import type { BuildContext } from '../planning/context';
import type { PhaseSpec } from '../planning/timing';

/** One run of the club rules for a request: what `planFromRules` needs to plan with it. */
export interface RuleRun {
  compiled: CompiledRuleSet;
  facts: Facts;
  outcome: RuleOutcome;
}

export interface EditContext {
  ctx: BuildContext;
  rules: AllocationRules;
  run: RuleRun;
}

/** The build context for `request` under the rule set, its randomness seeded by `seed`. */
export async function editContext(
  request: PlanRequest,
  ruleSet: RuleSetDocument,
  seed: string,
): Promise<EditContext> {
  const compiled = compileRuleSet(ruleSet);
  const facts = buildFacts(request, compiled.document.parameters);
  const outcome = await evaluateRules(compiled, facts);
  const ctx = planContext(request, outcome, seed);
  return { ctx, rules: allocationRules(ctx), run: { compiled, facts, outcome } };
}

/**
 * Phase `phaseIndex` of the plan built again, on its clock, from `candidates` tried in order
 * (none: everyone together in one grid), laid out after `lastPlayed`.
 */
export function rebuildPhase(
  edit: Pick<EditContext, 'ctx' | 'rules'>,
  plan: Plan,
  phaseIndex: number,
  candidates: ActivityDefinition[],
  lastPlayed: Phase | undefined,
): Phase {
  return buildPhase(edit.ctx, edit.rules, specOf(plan, phaseIndex, candidates), phaseIndex, {}, lastPlayed);
}

/** The spec that rebuilds a phase with the given activities to try, keeping its time and its keepers' role. */
function specOf(plan: Plan, phaseIndex: number, candidates: ActivityDefinition[]): PhaseSpec {
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

/** The station an edit names, or a RangeError when the plan has no such station in that phase. */
export function stationAt(plan: Plan, phaseIndex: number, stationId: string): Station {
  const station = plan.phases[phaseIndex]?.stations.find((s) => s.id === stationId);
  if (!station) throw new RangeError(`No station ${stationId} in phase ${phaseIndex}`);
  return station;
}

function hasKeeperWarmUp(phase: Phase): boolean {
  return phase.stations.some((s) => s.activityKind === 'goalkeeping');
}
