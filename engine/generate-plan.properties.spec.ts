/** Properties every generated plan must have, over random valid requests. */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import Ajv from 'ajv';
import planSchema from '../shared/schemas/plan.schema.json';
import requestSchema from '../shared/schemas/plan-request.schema.json';
import { checkPlan, generatePlan, defaultRuleSet, validatePlanRequest, PlanRequestError } from './index';
import { requestArb } from './testing/arbitraries';
import { brokenInvariants } from './testing/plan-invariants';

const RUNS = 200;

describe('generatePlan properties', () => {
  it('keeps every invariant: players once per phase, contiguous minutes, kit, space, ratios, ages, waiting', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb(), async (request) => {
        const plan = await generatePlan(request);
        expect(brokenInvariants(plan, defaultRuleSet)).toEqual([]);
        // checkPlan (used after edits) agrees that a fresh plan breaks nothing.
        expect(checkPlan(plan)).toEqual([]);
      }),
      { numRuns: RUNS },
    );
  }, 120_000);

  it('orders phases by rising intensity', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb(), async (request) => {
        const intensities = (await generatePlan(request)).phases.map((p) => p.intensity ?? 0);
        expect(intensities).toEqual([...intensities].sort((a, b) => a - b));
      }),
      { numRuns: RUNS },
    );
  }, 120_000);

  it('never schedules movement preparation for U12 and younger', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb(), async (request) => {
        const plan = await generatePlan(request);
        const young = defaultRuleSet.parameters.ageGroups[request.ageGroup].index <= 12;
        const kinds = plan.phases.flatMap((p) => p.stations.map((s) => s.activityKind));
        if (young) expect(kinds).not.toContain('movement-prep');
      }),
      { numRuns: RUNS },
    );
  }, 120_000);

  it('gives a byte-identical plan for the same request, seed and rule-set version', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb(), async (request) => {
        const a = JSON.stringify(await generatePlan(request));
        const b = JSON.stringify(await generatePlan(structuredClone(request)));
        expect(b).toBe(a);
      }),
      { numRuns: 100 },
    );
  }, 120_000);

  it('produces plans that satisfy the Plan JSON Schema', async () => {
    const ajv = new Ajv({ allErrors: true, strict: false });
    ajv.addSchema(requestSchema);
    const validate = ajv.compile(planSchema);
    await fc.assert(
      fc.asyncProperty(requestArb(), async (request) => {
        const plan = await generatePlan(request);
        expect(validate(plan), JSON.stringify(validate.errors)).toBe(true);
      }),
      { numRuns: 100 },
    );
  }, 120_000);

  it('answers random invalid requests with field errors, never a crash', async () => {
    const broken = fc.oneof(
      fc.anything(),
      requestArb().chain((r) =>
        fc
          .constantFrom(
            ['minutes', fc.oneof(fc.integer({ max: 4 }), fc.integer({ min: 121 }), fc.constant('ten'))],
            ['coaches', fc.oneof(fc.integer({ max: -1 }), fc.double())],
            ['players', fc.oneof(fc.constant([]), fc.array(fc.anything(), { minLength: 1, maxLength: 3 }))],
            ['ageGroup', fc.string()],
            ['equipment', fc.record({ balls: fc.integer({ max: -1 }), cones: fc.anything() })],
            ['space', fc.record({ width: fc.integer({ max: 0 }), length: fc.string() })],
            ['kind', fc.integer()],
          )
          .chain(([key, value]) =>
            (value as fc.Arbitrary<unknown>).map((v) => ({ ...r, [key as string]: v }) as unknown),
          ),
      ),
    );
    await fc.assert(
      fc.asyncProperty(broken, async (value) => {
        const result = validatePlanRequest(value);
        if (result.ok) return; // fc.anything() can, rarely, not be broken at all
        expect(result.errors.length).toBeGreaterThan(0);
        for (const e of result.errors) {
          expect(typeof e.field).toBe('string');
          expect(e.field.length).toBeGreaterThan(0);
          expect(e.message.length).toBeGreaterThan(0);
        }
        await expect(generatePlan(value as never)).rejects.toBeInstanceOf(PlanRequestError);
      }),
      { numRuns: RUNS },
    );
  }, 120_000);
});
