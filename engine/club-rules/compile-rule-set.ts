/**
 * Validates and compiles a rule set once per content and caches it, so a plan only pays for
 * running the rules.
 */
import { Engine } from 'json-rules-engine';
import type { RuleCondition, RuleSetDocument } from '../../shared/types';
import { validateRuleSet, type PointerError } from '../schema/validate-rule-set';

export interface CompiledRuleSet {
  document: RuleSetDocument;
  engine: Engine;
  /** Every fact a condition reads (as its fact or as a fact-valued right side); no others are passed. */
  factIds: string[];
}

/** The engine rule that carries all club rules; see `compileRuleSet`. */
const CLUB_RULES = 'club-rules';

export class RuleSetError extends Error {
  constructor(readonly errors: PointerError[]) {
    super(`Rule set refused: ${errors.map((e) => `${e.pointer} ${e.message}`).join('; ')}`);
    this.name = 'RuleSetError';
  }
}

/** How many compiled rule sets are kept by content: every edited draft a lead tries is a new one. */
export const MAX_COMPILED_RULE_SETS = 64;

const byObject = new WeakMap<object, CompiledRuleSet>();
/** Keyed by the document's whole JSON text (no hash that two drafts could share), oldest first. */
const byText = new Map<string, CompiledRuleSet>();

export function compileRuleSet(document: RuleSetDocument): CompiledRuleSet {
  const hit = byObject.get(document);
  if (hit) return hit;
  const text = JSON.stringify(document);
  const known = byText.get(text);
  if (known) {
    byText.delete(text);
    byText.set(text, known);
    byObject.set(document, known);
    return known;
  }
  const validation = validateRuleSet(document);
  if (!validation.ok) throw new RuleSetError(validation.errors);

  const engine = new Engine([], { allowUndefinedFacts: true });
  // One engine rule whose `any` holds every club rule's conditions, in document order: the engine
  // evaluates them all (nothing is skipped within one priority) and reports each one's result, so
  // a run builds one rule result and emits one event instead of one per club rule.
  engine.addRule({
    name: CLUB_RULES,
    conditions: { any: document.rules.map((rule) => unwrapped(rule.conditions)) } as never,
    event: { type: CLUB_RULES },
  });
  const factIds = new Set<string>();
  for (const rule of document.rules) collectFacts(rule.conditions, factIds);
  const compiled: CompiledRuleSet = { document, engine, factIds: [...factIds] };
  byText.set(text, compiled);
  if (byText.size > MAX_COMPILED_RULE_SETS) byText.delete(byText.keys().next().value!);
  byObject.set(document, compiled);
  return compiled;
}

/**
 * The same test with every one-item `all` or `any` replaced by its item (the engine evaluates a
 * lone condition directly either way): the engine copies the conditions on each run, so fewer
 * objects make every run cheaper. The document is not changed.
 */
function unwrapped(condition: RuleCondition): RuleCondition {
  if ('all' in condition || 'any' in condition) {
    const items = ('all' in condition ? condition.all : condition.any).map(unwrapped);
    if (items.length === 1) return items[0];
    return 'all' in condition ? { all: items } : { any: items };
  }
  if ('not' in condition) return { not: unwrapped(condition.not) };
  return condition;
}

function collectFacts(condition: RuleCondition, into: Set<string>): void {
  if ('all' in condition || 'any' in condition) {
    for (const c of 'all' in condition ? condition.all : condition.any) collectFacts(c, into);
  } else if ('not' in condition) {
    collectFacts(condition.not, into);
  } else {
    into.add(condition.fact);
    const { value } = condition;
    // The engine reads an object value with its own `fact` key as a reference to that fact.
    if (value !== null && typeof value === 'object' && Object.prototype.hasOwnProperty.call(value, 'fact')) {
      into.add(String((value as { fact: unknown }).fact));
    }
  }
}
