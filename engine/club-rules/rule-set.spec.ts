/** The rule-set document: schema and semantic checks with JSON pointers, compile cache, rule effects. */
import { describe, expect, it } from 'vitest';
import type { PlanRequest, RuleSetDocument } from '../../shared/types';
import { defaultRuleSet, generatePlan, RuleSetError, validateRuleSet } from '../index';
import { compileRuleSet, MAX_COMPILED_RULE_SETS } from './compile-rule-set';

const clone = (): RuleSetDocument => structuredClone(defaultRuleSet);

const request: PlanRequest = {
  ageGroup: 'U10',
  level: 'beginner',
  players: Array.from({ length: 12 }, (_, i) => ({ id: `p${i + 1}` })),
  coaches: 0,
  equipment: { balls: 20, cones: 60, bibs: 12, goals: 4 },
  space: { width: 60, length: 40 },
  minutes: 15,
  kind: 'match-warm-up',
  seed: 'rules',
};

describe('validateRuleSet', () => {
  it('accepts the default rule set', () => {
    expect(validateRuleSet(defaultRuleSet)).toEqual({ ok: true, errors: [] });
  });

  it('points at a missing table entry', () => {
    const doc = clone() as unknown as { parameters: { groupSizes: Record<string, unknown> } };
    delete doc.parameters.groupSizes['passing-pattern'];
    const result = validateRuleSet(doc);
    expect(result.ok).toBe(false);
    expect(result.errors).toContainEqual({
      pointer: '/parameters/groupSizes/passing-pattern',
      message: 'Group sizes › Passing practice: is missing.',
    });
  });

  it('points at a wrong type deep in the document', () => {
    const doc = clone() as unknown as {
      parameters: { areas: { 'keep-ball': { 'U9-U10': { step: unknown } } } };
    };
    doc.parameters.areas['keep-ball']['U9-U10'].step = 'two';
    expect(validateRuleSet(doc).errors.map((e) => e.pointer)).toContain(
      '/parameters/areas/keep-ball/U9-U10/step',
    );
  });

  it('points at an unknown key in a keyed table', () => {
    const doc = clone() as unknown as { parameters: { focusBoost: Record<string, number> } };
    doc.parameters.focusBoost['juggling'] = 2;
    expect(validateRuleSet(doc).errors).toContainEqual({
      pointer: '/parameters/focusBoost/juggling',
      message: 'Focus weight › Juggling: is not a setting Conewise knows here.',
    });
  });

  it('refuses 5v1 keep-ball (more than four attackers per defender)', () => {
    const doc = clone();
    doc.parameters.keepBall.beginner.formats[0] = { attackers: 5, defenders: 1 };
    const result = validateRuleSet(doc);
    expect(result.ok).toBe(false);
    expect(result.errors[0].pointer).toBe('/parameters/keepBall/beginner/formats/0');
    expect(result.errors[0].message).toBe('Keep-ball, Beginner: 5v1 has more than 4 attackers per defender.');
  });

  it('says in words which group size is out of order, at that cell', () => {
    const doc = clone();
    doc.parameters.groupSizes['keep-ball'].beginner = { min: 5, preferred: 5, max: 4 };
    expect(validateRuleSet(doc).errors).toEqual([
      {
        pointer: '/parameters/groupSizes/keep-ball/beginner/max',
        message: 'Keep-ball, Beginner: the most players in a group (4) is below the fewest (5).',
      },
    ]);
  });

  it('writes a measured limit with its metric unit, so a screen in yards can convert it', () => {
    const doc = clone();
    doc.parameters.keepBallLimits.minSideM = 120;
    doc.parameters.keepBallLimits.minM2PerPlayer = 101;
    const messages = validateRuleSet(doc).errors.map((e) => [e.pointer, e.message]);
    expect(messages).toContainEqual([
      '/parameters/keepBallLimits/minSideM',
      expect.stringMatching(/must be at most 100 m\.?$/),
    ]);
    expect(messages).toContainEqual([
      '/parameters/keepBallLimits/minM2PerPlayer',
      expect.stringMatching(/must be at most 100 m²\.?$/),
    ]);
    // A count keeps its bare number.
    doc.parameters.keepBallLimits.minSideM = 10;
    doc.parameters.keepBallLimits.minM2PerPlayer = 5;
    doc.parameters.groupSizes['keep-ball'].beginner.min = 0;
    expect(
      validateRuleSet(doc)
        .errors.map((e) => e.message)
        .join(' '),
    ).toMatch(/at least 1\b(?! m)/);
  });

  it('prints no codes, ids or pointers in its messages', () => {
    const doc = clone();
    doc.parameters.groupSizes.duel.advanced.preferred = 99;
    doc.parameters.areas['keep-ball']['U15-adult'].minWidth = 99;
    doc.parameters.activities[0].players = { min: 9, max: 2 };
    const messages = validateRuleSet(doc).errors.map((e) => e.message);
    expect(messages.length).toBe(3);
    for (const message of messages) {
      expect(message).not.toMatch(/\/|beginner|advanced|U\d|keep-ball|[a-z]+[A-Z][a-z]+/);
    }
  });

  it('refuses an unknown operator and an unknown event type inside a rule', () => {
    const doc = clone() as unknown as {
      rules: { conditions: { all: { operator: string }[] }; event: { type: string } }[];
    };
    doc.rules[2].conditions.all[0].operator = 'roughly';
    doc.rules[3].event.type = 'launch';
    const pointers = validateRuleSet(doc).errors.map((e) => e.pointer);
    expect(pointers.some((p) => p.startsWith('/rules/2/conditions/all/0'))).toBe(true);
    expect(pointers.some((p) => p.startsWith('/rules/3/event'))).toBe(true);
  });

  it('refuses duplicate rule ids and a parameter path that does not exist', () => {
    const doc = clone();
    doc.rules[1].id = doc.rules[0].id;
    const setter = doc.rules.findIndex((r) => r.event.type === 'set-parameter');
    (doc.rules[setter].event.params as { path: string }).path = 'layout.nowhere';
    const errors = validateRuleSet(doc).errors;
    expect(errors.map((e) => e.pointer)).toContain('/rules/1/id');
    expect(errors.find((e) => e.pointer === '/rules/1/id')?.message).toContain(
      `Reference: is the same as that of “${doc.rules[0].description.replace(/\.$/, '')}”`,
    );
    expect(errors.find((e) => e.pointer === `/rules/${setter}/event/params/path`)?.message).toMatch(
      /: changes a setting this rule set does not have\.$/,
    );
  });

  it('generatePlan refuses a bad rule set with the pointers', async () => {
    const doc = clone();
    doc.parameters.groupSizes['passing-pattern'].beginner.min = 9;
    await expect(generatePlan(request, doc)).rejects.toBeInstanceOf(RuleSetError);
  });
});

describe('compileRuleSet', () => {
  it('compiles once per id and version and content', () => {
    const a = compileRuleSet(defaultRuleSet);
    expect(compileRuleSet(defaultRuleSet)).toBe(a);
    expect(compileRuleSet(clone())).toBe(a); // same id, version and content
    const draft = clone();
    draft.parameters.layout.bufferM = 4;
    expect(compileRuleSet(draft)).not.toBe(a);
  });

  it('keeps a bounded number of compiled drafts, dropping the least recently used', () => {
    // Each keystroke a lead tries is a new draft: the cache must not grow with them.
    const draft = (bufferM: number): RuleSetDocument => {
      const d = clone();
      d.name = 'Cache bound';
      d.parameters.layout.bufferM = bufferM;
      return d;
    };
    const first = compileRuleSet(draft(0.5));
    const kept = compileRuleSet(draft(0.75));
    for (let i = 1; i < MAX_COMPILED_RULE_SETS; i++) {
      compileRuleSet(draft(1 + i / 100));
      if (i % 8 === 0) compileRuleSet(draft(0.75)); // used again, so it stays
    }
    expect(compileRuleSet(draft(0.75))).toBe(kept);
    expect(compileRuleSet(draft(0.5))).not.toBe(first);
  });
});

describe('club rules change plans', () => {
  it('a lead who allows only 3v1 for beginners gets 3v1 squares in the next plan', async () => {
    const doc = clone();
    doc.version = 2;
    doc.parameters.keepBall.beginner.formats = [{ attackers: 3, defenders: 1 }];
    const plan = await generatePlan(request, doc);
    const kb = plan.phases.flatMap((p) => p.stations).filter((s) => s.activityKind === 'keep-ball');
    expect(kb.length).toBe(3);
    expect(kb.every((s) => s.roles.attackers?.length === 3 && s.roles.defenders?.length === 1)).toBe(true);
    expect(plan.ruleSet).toEqual({ id: 'default', version: 2 });
  });

  it('heat: a caution with hydration and a shorter game, both in the trace', async () => {
    const plan = await generatePlan({
      ...request,
      kind: 'training',
      minutes: 40,
      conditions: { temperatureC: 31 },
    });
    const cool = await generatePlan({
      ...request,
      kind: 'training',
      minutes: 40,
      conditions: { temperatureC: 18 },
    });
    expect(plan.cautions.map((c) => c.code)).toContain('heat');
    expect(cool.cautions.map((c) => c.code)).not.toContain('heat');
    const gameMinutes = (p: typeof plan) =>
      p.phases
        .filter((ph) => ph.stations.some((s) => s.activityKind === 'small-sided-game'))
        .reduce((m, ph) => m + ph.endMinute - ph.startMinute, 0);
    expect(gameMinutes(plan)).toBeLessThan(gameMinutes(cool));
    expect(plan.trace.find((t) => t.ruleId === 'heat.shorter-game')?.fired).toBe(true);
  });

  it('a pressing focus picks activities that serve pressing, and from U13 keep-ball with two defenders', async () => {
    const u14: PlanRequest = { ...request, ageGroup: 'U14', level: 'intermediate', minutes: 30 };
    const plain = await generatePlan(u14);
    const pressing = await generatePlan({ ...u14, focus: ['pressing'] });
    const serves = (p: typeof plain) =>
      p.phases.filter((ph) =>
        defaultRuleSet.parameters.activities.find((a) => a.id === ph.activityId)?.focus.includes('pressing'),
      ).length;
    expect(serves(pressing)).toBeGreaterThan(serves(plain));
    expect(pressing.trace.find((t) => t.ruleId === 'focus.pressing-two-defenders')?.fired).toBe(true);
    for (const s of pressing.phases
      .flatMap((p) => p.stations)
      .filter((x) => x.activityKind === 'keep-ball')) {
      expect(s.roles.defenders).toHaveLength(2);
    }
  });

  it('the trace lists every rule of the set, fired or not', async () => {
    const plan = await generatePlan(request);
    for (const rule of defaultRuleSet.rules) {
      expect(plan.trace.find((t) => t.ruleId === rule.id)).toBeDefined();
    }
  });

  it('an absent seed is generated and returned, and replays the same plan', async () => {
    const { seed: _omit, ...noSeed } = request;
    const plan = await generatePlan(noSeed);
    expect(plan.seed).toMatch(/^[0-9a-z]{8}$/);
    expect(JSON.stringify(await generatePlan({ ...noSeed, seed: plan.seed }))).toBe(JSON.stringify(plan));
  });
});
