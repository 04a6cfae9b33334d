/** All club rules run as one engine rule: each must fire exactly as it would as a rule of its own. */
import fc from 'fast-check';
import { Engine } from 'json-rules-engine';
import { describe, expect, it } from 'vitest';
import type { RuleSetDocument } from '../../shared/types';
import { defaultRuleSet } from '../rule-sets';
import { requestArb } from '../testing/arbitraries';
import { compileRuleSet } from './compile-rule-set';
import { evaluateRules } from './evaluate-rules';
import { buildFacts } from './facts';

/** The default rules plus nested any, all and not, a fact on the right and an `in` list. */
function withNestedRules(): RuleSetDocument {
  const doc = structuredClone(defaultRuleSet);
  doc.id = 'nested-rules-spec';
  const warning = (code: string) => ({ type: 'warning', params: { code, message: code } }) as const;
  doc.rules.push(
    {
      id: 'spec.nested',
      description: 'nested any, all and not',
      conditions: {
        any: [
          {
            all: [
              { fact: 'playerCount', operator: 'greaterThan', value: 20 },
              { not: { fact: 'kind', operator: 'equal', value: 'training' } },
            ],
          },
          { fact: 'level', operator: 'in', value: ['beginner'] },
        ],
      },
      event: warning('nested'),
    },
    {
      id: 'spec.fact-on-right',
      description: 'fewer bibs than players',
      conditions: { all: [{ fact: 'bibs', operator: 'lessThan', value: { fact: 'playerCount' } }] },
      event: warning('bibs'),
    },
    {
      id: 'spec.one-item',
      description: 'one-item all, any and not around one condition',
      conditions: { all: [{ any: [{ not: { all: [{ fact: 'goals', operator: 'equal', value: 0 }] } }] }] },
      event: warning('one-item'),
    },
    { id: 'spec.empty-any', description: 'empty any', conditions: { any: [] }, event: warning('empty') },
  );
  return doc;
}

/** The plain way: one json-rules-engine rule per club rule. */
async function firedOneByOne(doc: RuleSetDocument, facts: Record<string, unknown>): Promise<string[]> {
  const engine = new Engine([], { allowUndefinedFacts: true });
  for (const rule of doc.rules) {
    engine.addRule({ name: rule.id, conditions: rule.conditions as never, event: rule.event as never });
  }
  const { results } = await engine.run(facts);
  const fired = new Set(results.map((r) => r.name));
  return doc.rules.filter((r) => fired.has(r.id)).map((r) => r.id);
}

describe('evaluateRules', () => {
  it('fires the same rules as one engine rule per club rule, and traces every rule', async () => {
    const docs = [defaultRuleSet, withNestedRules()];
    await fc.assert(
      fc.asyncProperty(requestArb(), fc.constantFrom(...docs), async (request, doc) => {
        const facts = buildFacts(request, doc.parameters);
        const outcome = await evaluateRules(compileRuleSet(doc), facts);
        expect(outcome.trace.map((t) => t.ruleId)).toEqual(doc.rules.map((r) => r.id));
        const fired = outcome.trace.filter((t) => t.fired).map((t) => t.ruleId);
        expect(fired).toEqual(await firedOneByOne(doc, facts));
      }),
      { numRuns: 200 },
    );
  });
});
