import * as engineModule from '../../engine';
import type { Plan } from '../../shared/types/plan';
import type { PlanEdit, PlayerMove, RosterChange, StationVerdict } from '../../shared/types/plan-edit';
import type { PlanRequest } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import type { FieldError } from '../http/problem';

/**
 * The server's one doorway into engine/. Results are normalised here (sync or async, bare value
 * or wrapped), so services see one shape whatever the engine's return conventions.
 */
type Loose = (...args: unknown[]) => unknown;
const engine = engineModule as unknown as Record<string, Loose | unknown>;

function fn(name: string): Loose {
  const f = engine[name];
  if (typeof f !== 'function') throw new Error(`engine/ does not export ${name}()`);
  return f as Loose;
}

/** The engine's built-in rule set (used when a club has published none). */
export function defaultRules(): RuleSetDocument {
  const value = engine['defaultRuleSet'];
  const doc = typeof value === 'function' ? (value as Loose)() : value;
  return structuredClone(doc) as RuleSetDocument;
}

/** Problems as { field, message }, field a JSON pointer-like path under `prefix`. */
function issues(result: unknown, prefix: string): FieldError[] {
  if (result === true || result === undefined || result === null) return [];
  const r = result as { valid?: boolean; ok?: boolean; errors?: unknown[]; issues?: unknown[] };
  const list = Array.isArray(result) ? result : (r.errors ?? r.issues ?? []);
  if (!Array.isArray(list)) return [];
  return list.map((item) => {
    if (typeof item === 'string') return { field: prefix || '(body)', message: item };
    const e = item as {
      pointer?: string;
      path?: string;
      instancePath?: string;
      field?: string;
      message?: string;
    };
    const raw = e.pointer ?? e.path ?? e.instancePath ?? e.field ?? '';
    const pointer = raw && !raw.startsWith('/') ? `/${raw.replace(/\./g, '/')}` : raw;
    return { field: `${prefix}${pointer}` || '(body)', message: e.message ?? 'is not valid' };
  });
}

/** Field errors in a plan request; empty when the engine accepts it. */
export function planRequestErrors(request: unknown, prefix = 'request'): FieldError[] {
  return issues(fn('validatePlanRequest')(request), prefix);
}

/** Field errors (JSON pointers) in a rule-set document; empty when valid. */
export function ruleSetErrors(body: unknown, prefix = 'body'): FieldError[] {
  return issues(fn('validateRuleSet')(body), prefix);
}

export async function generatePlan(request: PlanRequest, rules: RuleSetDocument): Promise<Plan> {
  return unwrapPlan(await fn('generatePlan')(request, rules));
}

/** A rule broken by a plan: what and where. */
export interface Violation {
  code: string;
  message: string;
  phaseIndex?: number;
  stationId?: string;
}

export async function checkPlan(plan: Plan, rules: RuleSetDocument): Promise<Violation[]> {
  const result = await fn('checkPlan')(plan, rules);
  const list = Array.isArray(result)
    ? result
    : ((result as { violations?: unknown[]; errors?: unknown[] })?.violations ??
      (result as { errors?: unknown[] })?.errors ??
      []);
  return (list as Partial<Violation>[]).map((v) => ({
    ...v,
    code: v.code ?? 'rule',
    message: v.message ?? String(v),
  }));
}

/** Applies one coach edit and re-checks the result. */
export async function applyEdit(
  plan: Plan,
  edit: PlanEdit,
  rules: RuleSetDocument,
): Promise<{ plan: Plan; violations: Violation[] }> {
  const result = await fn('applyEdit')(plan, edit, rules);
  const edited = unwrapPlan(result);
  const reported = (result as { violations?: Violation[] })?.violations;
  return { plan: edited, violations: reported ?? (await checkPlan(edited, rules)) };
}

export async function replan(
  plan: Plan,
  change: RosterChange,
  rules: RuleSetDocument,
): Promise<{ plan: Plan; moves: PlayerMove[] }> {
  const result = (await fn('replan')(plan, change, rules)) as { plan?: Plan; moves?: PlayerMove[] };
  return { plan: unwrapPlan(result), moves: result?.moves ?? [] };
}

export async function applyProgression(
  plan: Plan,
  step: { phaseIndex: number; stationId: string; verdict: StationVerdict },
  rules: RuleSetDocument,
): Promise<Plan> {
  const apply = fn('applyProgression');
  // The engine may take the step as one object or as separate arguments.
  const result =
    apply.length >= 4
      ? await apply(plan, step.phaseIndex, step.stationId, step.verdict, rules)
      : await apply(plan, step, rules);
  return unwrapPlan(result);
}

function unwrapPlan(result: unknown): Plan {
  const r = result as { plan?: Plan; phases?: unknown };
  if (r && Array.isArray(r.phases)) return result as Plan;
  if (r?.plan && Array.isArray(r.plan.phases)) return r.plan;
  throw new Error('engine returned no plan');
}
