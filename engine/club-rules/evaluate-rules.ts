/** Runs the club's json-rules-engine rules on the facts and turns fired events into effects. */
import '../../shared/i18n/localize';
import type {
  ActivityKind,
  StationKind,
  ForbiddenActivity,
  Notice,
  RuleEvent,
  RuleParameters,
  TraceEntry,
} from '../../shared/types';
import { Fact } from 'json-rules-engine';
import { ACTIVITY_KIND_LABELS } from '../../shared/types/activity-words';
import type { CompiledRuleSet } from './compile-rule-set';
import type { Facts } from './facts';

export interface ProgressionStep {
  direction: 'harder' | 'easier' | 'keep';
  reason: string;
  ruleId: string;
}

export interface RuleOutcome {
  /** The rule set's parameters with every fired set-parameter applied. */
  parameters: RuleParameters;
  forbidden: ForbiddenActivity[];
  required: { kind: StationKind; reason: string }[];
  warnings: Notice[];
  cautions: Notice[];
  steps: Partial<Record<StationKind, ProgressionStep>>;
  trace: TraceEntry[];
}

/** The engine's result for the one rule carrying all club rules: one root condition per club rule. */
interface ClubRulesResult {
  conditions: { any: { result?: boolean }[] };
}

export async function evaluateRules(compiled: CompiledRuleSet, facts: Facts): Promise<RuleOutcome> {
  const { results, failureResults } = await compiled.engine.run(constantFacts(facts, compiled.factIds));
  const doc = compiled.document;
  const run = (results[0] ?? failureResults[0]) as unknown as ClubRulesResult | undefined;
  const verdicts = run?.conditions.any ?? [];

  const outcome: RuleOutcome = {
    parameters: doc.parameters,
    forbidden: [],
    required: [],
    warnings: [],
    cautions: [],
    steps: {},
    trace: [],
  };
  const overrides: { path: string; value: unknown }[] = [];

  doc.rules.forEach((rule, i) => {
    const result = verdicts[i]?.result;
    if (result === undefined) return;
    const didFire = result === true;
    const entry: TraceEntry = { ruleId: rule.id, description: rule.description, fired: didFire };
    if (didFire) entry.effect = applyEvent(rule.id, rule.event, outcome, overrides, doc.parameters);
    outcome.trace.push(entry);
  });
  if (overrides.length) outcome.parameters = withOverrides(doc.parameters, overrides);
  return outcome;
}

const UNCACHED = { cache: false };

/**
 * The facts some condition reads, as uncached constants: a constant is read directly, so hashing
 * a cache key would be waste, and a fact no condition reads would only be allocated.
 */
function constantFacts(facts: Facts, ids: string[]): Record<string, Fact> {
  const out: Record<string, Fact> = {};
  for (const id of ids) {
    if (Object.prototype.hasOwnProperty.call(facts, id)) out[id] = new Fact(id, facts[id], UNCACHED);
  }
  return out;
}

function applyEvent(
  ruleId: string,
  event: RuleEvent,
  outcome: RuleOutcome,
  overrides: { path: string; value: unknown }[],
  parameters: RuleParameters,
): string {
  // What the rule did, in a sentence a head of coaching reads (no codes or ids).
  switch (event.type) {
    case 'set-parameter':
      overrides.push({ path: event.params.path, value: event.params.value });
      return event.params.effect;
    case 'forbid-activity':
      outcome.forbidden.push({ ...event.params });
      return $localize`:what a club rule did, an activity it left out of the plan and the rule's reason:Leaves out ${leftOut(event.params, parameters)}:activity:: ${event.params.reason}:reason:`;
    case 'require-activity':
      outcome.required.push({ kind: event.params.kind, reason: event.params.reason });
      return $localize`:what a club rule did, a kind of activity it added to the plan and the rule's reason:Adds ${ACTIVITY_KIND_LABELS[event.params.kind] ?? anActivity()}:activity:: ${event.params.reason}:reason:`;
    case 'warning':
      outcome.warnings.push({ code: event.params.code, message: event.params.message });
      return $localize`:what a club rule did, a note it added for the coach:Adds a note for the coach: ${event.params.message}:note:`;
    case 'caution':
      outcome.cautions.push({ ...event.params });
      return $localize`:what a club rule did, a safety note it added to the plan:Adds a safety note: ${event.params.message}:note:`;
    case 'progression-step':
      outcome.steps[event.params.kind] = {
        direction: event.params.direction,
        reason: event.params.reason,
        ruleId,
      };
      return event.params.reason;
  }
}

/** "the Rondo square" (an activity, by its title) or "Keep-ball" (a kind). */
function leftOut(params: { kind?: ActivityKind; activityId?: string }, parameters: RuleParameters): string {
  if (params.activityId) {
    const title = parameters.activities.find((a) => a.id === params.activityId)?.title;
    return title
      ? $localize`:an activity's title in quotation marks, left out of a plan by a club rule:“${title}:activity:”`
      : $localize`:an activity left out of a plan by a club rule, not named:one activity`;
  }
  return params.kind ? ACTIVITY_KIND_LABELS[params.kind] : anActivity();
}

/** Any one activity, when a rule names neither a kind nor an activity. */
function anActivity(): string {
  return $localize`:an activity a club rule adds or leaves out, not named:an activity`;
}

/** Copies only the branches an override touches; the cached document stays untouched. */
function withOverrides(base: RuleParameters, overrides: { path: string; value: unknown }[]): RuleParameters {
  const root: Record<string, unknown> = { ...base };
  for (const { path, value } of overrides) {
    const keys = path.split('.');
    let node = root;
    for (let i = 0; i < keys.length - 1; i++) {
      const child = { ...(node[keys[i]] as Record<string, unknown>) };
      node[keys[i]] = child;
      node = child;
    }
    node[keys[keys.length - 1]] = value;
  }
  return root as unknown as RuleParameters;
}
