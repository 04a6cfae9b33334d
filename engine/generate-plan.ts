/** The pipeline: validate, run the club rules, plan phases, build each phase, sum up, trace. */
import type { ActivityKind, Plan, PlanRequest, RuleSetDocument } from '../shared/types';
import { kindBlocked } from './build/activities';
import type { AllocationRules } from './build/allocation';
import { areaTable, baseWidth, describeArea, type StartWidths } from './build/areas';
import { buildPhase } from './build/build-phase';
import type { BuildContext } from './build/context';
import { steppedWidth } from './build/areas';
import { summarize } from './build/summary';
import { planPhases } from './build/timing';
import { ESTIMATE_NOTE } from './build/touches';
import { createRng, generateSeed } from './random';
import { defaultRuleSet } from './rule-sets';
import { compileRuleSet } from './rules/compile-rule-set';
import { evaluateRules } from './rules/evaluate-rules';
import { buildFacts } from './rules/facts';
import { validatePlanRequest, type FieldError } from './schema/validate-plan-request';

export class PlanRequestError extends Error {
  constructor(readonly errors: FieldError[]) {
    super(`Invalid plan request: ${errors.map((e) => `${e.field} ${e.message}`).join('; ')}`);
    this.name = 'PlanRequestError';
  }
}

export async function generatePlan(
  request: PlanRequest,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Promise<Plan> {
  const validation = validatePlanRequest(request);
  if (!validation.ok) throw new PlanRequestError(validation.errors);
  const compiled = compileRuleSet(ruleSet);
  const seed = request.seed ?? generateSeed();
  // Object.assign, not a spread: in V8 a spread that adds a key (a request without a seed) costs
  // about 2 us; the keys and their order are the same.
  const req: PlanRequest = Object.assign({}, request, { seed });
  const base = compiled.document.parameters;
  const outcome = await evaluateRules(compiled, buildFacts(req, base));
  const params = outcome.parameters;
  const ctx: BuildContext = {
    request: req,
    params,
    band: params.ageGroups[req.ageGroup].band,
    forbidden: outcome.forbidden,
    outcome,
    rng: createRng(seed),
    warnings: [...outcome.warnings],
    trace: [...outcome.trace],
  };
  const rules: AllocationRules = {
    params,
    level: req.level,
    kit: req.equipment,
    usable: (kind) => kindBlocked(params, req.ageGroup, ctx.forbidden, kind) === null,
  };
  const startWidths = feedbackWidths(ctx);
  const specs = planPhases(ctx, rules);
  const phases = specs.map((spec, i) => buildPhase(ctx, rules, spec, i, startWidths));
  const totals = summarize(phases, params, req.minutes, ctx.warnings);
  ctx.trace.push({
    ruleId: 'engine.estimates',
    fired: true,
    effect: `touches per player ${range(Object.values(totals.touches))}, active share ${totals.activeShare} (estimates)`,
  });
  return {
    request: req,
    phases,
    equipmentNeeded: totals.equipmentNeeded,
    equipmentAvailable: { ...req.equipment },
    touches: totals.touches,
    activeShare: totals.activeShare,
    warnings: ctx.warnings,
    cautions: outcome.cautions,
    trace: ctx.trace,
    ruleSet: { id: compiled.document.id, version: compiled.document.version },
    seed,
    estimateNote: ESTIMATE_NOTE,
    forbiddenActivities: outcome.forbidden,
  };
}

/**
 * Where last time's feedback says to start: from the area that ran (or the table's), one step
 * harder or easier as the club's feedback rules decide, for the group that gave the verdict;
 * each new group scales it to its own size (`widthForGroup`).
 */
function feedbackWidths(ctx: BuildContext): StartWidths {
  const out: StartWidths = {};
  for (const [kind, step] of Object.entries(ctx.outcome.steps) as [
    ActivityKind,
    NonNullable<BuildContext['outcome']['steps'][ActivityKind]>,
  ][]) {
    const fb = ctx.request.recentFeedback?.find((f) => f.activityKind === kind);
    const table = areaTable(ctx.params, kind, ctx.band);
    const typical = ctx.params.groupSizes[kind][ctx.request.level].preferred;
    // The table's width is the shorter side; a rotated station may report its sides either way round.
    const reported =
      fb?.areaWidth !== undefined ? Math.min(fb.areaWidth, fb.areaLength ?? fb.areaWidth) : undefined;
    const from = reported ?? Math.round(baseWidth(ctx.params, kind, ctx.band, ctx.request.level, typical));
    // The group the width was for: the one that ran it, else the table's typical group.
    const forGroup = reported !== undefined ? fb?.groupSize : typical;
    const harderSign = ctx.params.kinds[kind].harderWhenArea === 'smaller' ? -1 : 1;
    const steps = step.direction === 'keep' ? 0 : step.direction === 'harder' ? harderSign : -harderSign;
    const width = steppedWidth(table, from, steps);
    out[kind] = forGroup ? { width, forGroup } : { width };
    const group = forGroup ? ` for a group of ${forGroup}, scaled to each group's size` : '';
    ctx.trace.push({
      ruleId: 'engine.feedback-start',
      description: `Start ${kind} from recent feedback (${step.ruleId})`,
      fired: true,
      effect: `${kind} area starts at ${describeArea({ width, length: width })} wide${group} (last ${from} m): ${step.reason}`,
    });
  }
  return out;
}

function range(values: number[]): string {
  if (!values.length) return 'none';
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  return lo === hi ? `${lo}` : `${lo}–${hi}`;
}
