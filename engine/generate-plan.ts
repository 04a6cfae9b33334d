/**
 * The pipeline: validate, run the club rules, check supervision, shape the session (theme,
 * parts, pins), time it with drinks breaks, plan the keepers, build each phase, count the
 * changeovers, sum up, trace.
 */
import '../shared/i18n/localize';
import type { Phase, Plan, PlanRequest, RuleSetDocument, StationKind } from '../shared/types';
import { FOCUS_LABELS } from '../shared/types';
import { compileRuleSet, type CompiledRuleSet } from './club-rules/compile-rule-set';
import { evaluateRules, type RuleOutcome } from './club-rules/evaluate-rules';
import { stepsByVerdict } from './club-rules/feedback-steps';
import { buildFacts, type Facts } from './club-rules/facts';
import { rankedActivities } from './planning/activities';
import type { AllocationRules } from './planning/allocation';
import type { StartWidths } from './planning/areas';
import { buildPhase } from './planning/build-phase';
import { changeoverBetween } from './planning/changeover';
import type { BuildContext } from './planning/context';
import { effectiveParameters } from './planning/effective-parameters';
import { feedbackStarts, feedbackTrace } from './planning/feedback-start';
import { eligibleKeepers, planKeepers } from './planning/goalkeepers';
import { chooseTheme, sessionSlots } from './planning/session-shape';
import { summarize } from './planning/summary';
import { superviseRequest } from './planning/supervision';
import { planTimeline } from './planning/timing';
import { estimateNote } from './planning/touches';
import { createRng, generateSeed } from './random';
import { defaultRuleSet } from './rule-sets';
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
  const req = Object.assign({}, request, { seed });
  const facts = buildFacts(req, compiled.document.parameters);
  return planFromRules(compiled, req, facts, await evaluateRules(compiled, facts));
}

/**
 * The plan for a valid request with its seed set, once the club rules have run on its facts:
 * a re-plan that has run them already builds its fresh plan here rather than run them again.
 */
export async function planFromRules(
  compiled: CompiledRuleSet,
  req: PlanRequest & { seed: string },
  facts: Facts,
  outcome: RuleOutcome,
): Promise<Plan> {
  const seed = req.seed;
  const verdictSteps = await stepsByVerdict(compiled, facts, req.recentFeedback, outcome.steps);
  const ctx = planContext(req, outcome, seed);
  const rules = allocationRules(ctx);
  const theme = chooseTheme(ctx);
  if (theme) {
    ctx.focus = [theme, ...ctx.focus.filter((f) => f !== theme)];
    const themeWords = FOCUS_LABELS[theme].toLowerCase();
    ctx.trace.push({
      ruleId: 'engine.theme',
      fired: true,
      effect: req.focus?.length
        ? $localize`:why panel, the session's theme taken from what the coach asked for first:theme: ${themeWords}:theme: (the coach's first focus)`
        : $localize`:why panel, the session's theme chosen because recent plans used it least:theme: ${themeWords}:theme: (the one the team's recent plans used least)`,
    });
  }
  const slots = sessionSlots(ctx, rules, theme);
  const specs = planTimeline(ctx, slots);
  planKeepers(ctx, specs);
  const { widths, starts } = feedbackStarts(ctx, verdictSteps);
  const phases = buildPhases(ctx, rules, specs, widths);
  feedbackTrace(ctx, starts, phases);
  const totals = summarize(phases, ctx.params, req.minutes, ctx.warnings);
  ctx.trace.push({
    ruleId: 'engine.estimates',
    fired: true,
    effect: $localize`:why panel, estimated touches per player (a number or a range such as 40–55) and the share of time on the ball:Each player: about ${range(Object.values(totals.touches))}:touches: touches, on the ball or in play ${Math.round(totals.activeShare * 100)}:percent:% of the time (estimates)`,
  });
  const plan: Plan = {
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
    estimateNote: estimateNote(),
    forbiddenActivities: outcome.forbidden,
    supervision: ctx.supervision,
  };
  if (theme) plan.theme = theme;
  return plan;
}

/** The build context for a request once the club rules have run. */
export function planContext(req: PlanRequest, outcome: RuleOutcome, seed: string): BuildContext {
  const params = effectiveParameters(outcome.parameters, req);
  const band = params.ageGroups[req.ageGroup].band;
  const { supervision, warnings: supervisionWarnings } = superviseRequest(req, params);
  const { keepers, warnings: keeperWarnings } = eligibleKeepers(req, params, band);
  const t = req.conditions?.temperatureC;
  return {
    request: req,
    params,
    band,
    forbidden: outcome.forbidden,
    outcome,
    rng: createRng(seed),
    warnings: [...outcome.warnings, ...supervisionWarnings, ...keeperWarnings],
    trace: [...outcome.trace],
    supervision,
    keepers,
    cold: t !== undefined && t <= params.cautions.coldC,
    hot: t !== undefined && t >= params.cautions.heatC,
    focus: [...(req.focus ?? [])],
    recent: new Set(req.recentActivityIds ?? []),
    pinned: new Set(req.pinnedActivityIds ?? []),
  };
}

export function allocationRules(ctx: BuildContext): AllocationRules {
  return {
    params: ctx.params,
    level: ctx.request.level,
    band: ctx.band,
    kit: ctx.request.equipment,
    substitutes: (kind: StationKind) => rankedActivities(ctx, kind).map((r) => r.activity),
  };
}

/** Every phase in order, each laid out after the last one played, with its changeover. */
function buildPhases(
  ctx: BuildContext,
  rules: AllocationRules,
  specs: ReturnType<typeof planTimeline>,
  startWidths: StartWidths,
): Phase[] {
  const phases: Phase[] = [];
  let lastPlayed: Phase | undefined;
  const played = new Set<string>();
  let breakSince = false;
  let warmed = false;
  specs.forEach((planned, i) => {
    // Keepers go in goal only once their own warm-up has really run; if it could not (the phase
    // fell back to one shared grid), they warm up as keepers in this phase instead.
    const spec =
      planned.keepersInGoal && !warmed ? { ...planned, keepersInGoal: false, keeperWarmUp: true } : planned;
    const phase = buildPhase(ctx, rules, spec, i, startWidths, lastPlayed, played);
    if (phase.activityId) played.add(phase.activityId);
    if (phase.stations.some((s) => s.activityKind === 'goalkeeping')) warmed = true;
    if (phase.activityKind !== 'break') {
      phase.changeover = changeoverBetween(
        lastPlayed,
        phase,
        ctx.params,
        ctx.request.kind === 'training',
        breakSince || !lastPlayed,
      );
      lastPlayed = phase;
      breakSince = false;
    } else breakSince = true;
    phases.push(phase);
  });
  if (ctx.keepers.length && !warmed && ctx.request.kind === 'match-warm-up') {
    ctx.warnings.push({
      code: 'keepers-not-warmed',
      message: $localize`:notice on a match warm-up with no goalkeepers' warm-up in it:No room for the keepers’ own warm-up in this plan, so they play out: warm them up as keepers before kick-off (handling, footwork, then shots), away from the others.`,
    });
  }
  return phases;
}

function range(values: number[]): string {
  if (!values.length)
    return $localize`:why panel, no touches to estimate, in place of a number of touches:none`;
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  return lo === hi ? `${lo}` : `${lo}–${hi}`;
}
