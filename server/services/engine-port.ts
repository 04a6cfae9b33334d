import '../../shared/i18n/localize';
import {
  applyEdit as engineApplyEdit,
  applyProgression as engineApplyProgression,
  checkPlan as engineCheckPlan,
  defaultRuleSet,
  generatePlan as engineGeneratePlan,
  PlanRequestError,
  replan as engineReplan,
  validatePlanRequest,
  validateRuleSet,
} from '../../engine';
import type { Notice, Plan } from '../../shared/types/plan';
import type { PlanEdit, PlayerMove, RosterChange, StationVerdict } from '../../shared/types/plan-edit';
import type { PlanRequest } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { badRequest, type FieldError } from '../http/problem';

/**
 * The server's one doorway into engine/: engine errors about bad input become 400 problems here,
 * so services never leak an engine exception as a 500.
 */

/** Differences between two JSON documents, as JSON pointers. */
export { jsonDiff } from '../../engine';

/** The engine's built-in rule set (used when a club has published none). Treat as read-only. */
export function defaultRules(): RuleSetDocument {
  return defaultRuleSet;
}

const join = (prefix: string, field: string) =>
  !field || field.startsWith('(') ? prefix || '(body)' : `${prefix}/${field.replace(/^\//, '')}`;

/** Field errors in a plan request, each under `prefix` (e.g. "request/players/3/id"). */
export function planRequestErrors(request: unknown, prefix = 'request'): FieldError[] {
  return validatePlanRequest(request).errors.map((e) => ({
    field: join(prefix, e.field),
    message: e.message,
  }));
}

/** Field errors in a rule-set document, named by JSON pointer under `prefix` (e.g. "body/parameters/…"). */
export function ruleSetErrors(body: unknown, prefix = 'body'): FieldError[] {
  return validateRuleSet(body).errors.map((e) => ({ field: `${prefix}${e.pointer}`, message: e.message }));
}

/** A rule broken by a plan: what and where. */
export type Violation = Notice;

async function guarded<T>(work: () => T | Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof PlanRequestError) {
      throw badRequest(
        $localize`The plan request is not valid.`,
        error.errors.map((e) => ({ field: join('request', e.field), message: e.message })),
      );
    }
    // The engine throws RangeError for a phase, station or player the plan does not have: the
    // page asking was opened on an older plan. Its ids are for developers, not for the coach.
    if (error instanceof RangeError)
      throw badRequest(
        $localize`That part of the plan is no longer there: the plan has changed since this page was opened. Reload the plan and try again.`,
      );
    throw error;
  }
}

export function generatePlan(request: PlanRequest, rules: RuleSetDocument): Promise<Plan> {
  return guarded(() => engineGeneratePlan(request, rules));
}

export function checkPlan(plan: Plan, rules: RuleSetDocument): Promise<Violation[]> {
  return guarded(() => engineCheckPlan(plan, rules));
}

/** Applies one coach edit and re-checks the result against the invariants of a fresh plan. */
export async function applyEdit(
  plan: Plan,
  edit: PlanEdit,
  rules: RuleSetDocument,
): Promise<{ plan: Plan; violations: Violation[] }> {
  const edited = await guarded(() => engineApplyEdit(plan, edit, rules));
  return { plan: edited, violations: await checkPlan(edited, rules) };
}

export function replan(
  plan: Plan,
  change: RosterChange,
  rules: RuleSetDocument,
): Promise<{ plan: Plan; moves: PlayerMove[] }> {
  return guarded(() => engineReplan(plan, change, rules));
}

export function applyProgression(
  plan: Plan,
  step: { phaseIndex: number; stationId: string; verdict: StationVerdict },
  rules: RuleSetDocument,
): Promise<Plan> {
  return guarded(() => engineApplyProgression(plan, step.phaseIndex, step.stationId, step.verdict, rules));
}
