/**
 * Refuses a bad rule set with messages that point into the document (JSON pointers):
 * first the JSON Schema, then checks a schema cannot express (unique ids, sizes in order,
 * keep-ball never 5v1 or worse, every kind playable).
 */
import type { ErrorObject, ValidateFunction } from 'ajv';
import { AGE_GROUPS, LEVELS, STATION_KINDS, type RuleSetDocument } from '../../shared/types';
import { kindLayouts } from '../kinds/registry';
// Precompiled from shared/schemas/rule-set.schema.json: no eval, so it runs under the app's CSP.
import generated from './generated/rule-set.validator';

export interface PointerError {
  pointer: string;
  message: string;
}

export interface RuleSetValidation {
  ok: boolean;
  errors: PointerError[];
}

const compiled = () => generated as unknown as ValidateFunction;

export function validateRuleSet(value: unknown): RuleSetValidation {
  const validate = compiled();
  if (!validate(value)) {
    const errors = dedupe(
      (validate.errors ?? [])
        .filter((e) => e.keyword !== 'oneOf' && e.keyword !== 'propertyNames')
        .map(describe),
    );
    return { ok: false, errors };
  }
  const errors = semanticErrors(value as RuleSetDocument);
  return { ok: errors.length === 0, errors };
}

function describe(e: ErrorObject): PointerError {
  const p = e.params as Record<string, unknown>;
  if (e.keyword === 'required') {
    return { pointer: `${e.instancePath}/${String(p['missingProperty'])}`, message: 'is required' };
  }
  const propertyName = (e as ErrorObject & { propertyName?: string }).propertyName;
  if (propertyName !== undefined) {
    return { pointer: `${e.instancePath}/${propertyName}`, message: 'is not a known key here' };
  }
  if (e.keyword === 'additionalProperties') {
    return {
      pointer: `${e.instancePath}/${String(p['additionalProperty'])}`,
      message: 'is not a known field',
    };
  }
  if (e.keyword === 'enum') {
    return {
      pointer: e.instancePath || '/',
      message: `must be one of ${(p['allowedValues'] as unknown[]).join(', ')}`,
    };
  }
  return { pointer: e.instancePath || '/', message: e.message ?? 'is invalid' };
}

function semanticErrors(doc: RuleSetDocument): PointerError[] {
  const errors: PointerError[] = [];
  const params = doc.parameters;

  const ruleIds = new Map<string, number>();
  doc.rules.forEach((rule, i) => {
    const first = ruleIds.get(rule.id);
    if (first !== undefined)
      errors.push({ pointer: `/rules/${i}/id`, message: `duplicates /rules/${first}/id` });
    else ruleIds.set(rule.id, i);
  });

  const activityIds = new Map<string, number>();
  params.activities.forEach((a, i) => {
    const first = activityIds.get(a.id);
    if (first !== undefined)
      errors.push({
        pointer: `/parameters/activities/${i}/id`,
        message: `duplicates /parameters/activities/${first}/id`,
      });
    else activityIds.set(a.id, i);
  });
  for (const kind of STATION_KINDS) {
    if (!params.activities.some((a) => a.kind === kind && !a.retired)) {
      errors.push({
        pointer: '/parameters/activities',
        message: `needs at least one activity of kind ${kind}`,
      });
    }
  }
  params.activities.forEach((a, i) => {
    const at = `/parameters/activities/${i}`;
    if (a.layout !== undefined && !kindLayouts(a.kind).some((l) => l.id === a.layout)) {
      errors.push({
        pointer: `${at}/layout`,
        message: `must be one of ${kindLayouts(a.kind)
          .map((l) => l.id)
          .join(', ')} for ${a.kind}`,
      });
    }
    if (AGE_GROUPS.indexOf(a.ages.from) > AGE_GROUPS.indexOf(a.ages.to)) {
      errors.push({ pointer: `${at}/ages`, message: 'needs the youngest age first' });
    }
    if (a.players.min > a.players.max) {
      errors.push({ pointer: `${at}/players`, message: 'needs min ≤ max' });
    }
  });

  for (const kind of STATION_KINDS) {
    for (const level of LEVELS) {
      const g = params.groupSizes[kind][level];
      if (!(g.min <= g.preferred && g.preferred <= g.max)) {
        errors.push({
          pointer: `/parameters/groupSizes/${kind}/${level}`,
          message: 'needs min ≤ preferred ≤ max',
        });
      }
    }
    for (const [band, a] of Object.entries(params.areas[kind])) {
      if (a.minWidth > a.maxWidth) {
        errors.push({ pointer: `/parameters/areas/${kind}/${band}`, message: 'needs minWidth ≤ maxWidth' });
      }
    }
  }

  for (const level of LEVELS) {
    const kb = params.keepBall[level];
    kb.formats.forEach((f, i) => {
      const ratio = f.attackers / f.defenders;
      if (ratio > kb.maxAttackersPerDefender || ratio > 4 || ratio < 2) {
        errors.push({
          pointer: `/parameters/keepBall/${level}/formats/${i}`,
          message:
            ratio < 2
              ? `${f.attackers}v${f.defenders} has fewer than 2 attackers per defender`
              : `${f.attackers}v${f.defenders} has more than ${Math.min(4, kb.maxAttackersPerDefender)} attackers per defender`,
        });
      }
    });
  }

  doc.rules.forEach((rule, i) => {
    const event = rule.event;
    if (event.type === 'forbid-activity') {
      if (!event.params.kind && !event.params.activityId) {
        errors.push({ pointer: `/rules/${i}/event/params`, message: 'names a kind or an activityId' });
      }
      if (event.params.activityId && !activityIds.has(event.params.activityId)) {
        errors.push({
          pointer: `/rules/${i}/event/params/activityId`,
          message: 'is not an activity in this rule set',
        });
      }
    }
    if (event.type === 'set-parameter' && !hasPath(params, event.params.path)) {
      errors.push({
        pointer: `/rules/${i}/event/params/path`,
        message: 'does not name an existing parameter',
      });
    }
  });
  return errors;
}

function hasPath(root: unknown, path: string): boolean {
  let node: unknown = root;
  for (const key of path.split('.')) {
    if (node === null || typeof node !== 'object' || !(key in (node as object))) return false;
    node = (node as Record<string, unknown>)[key];
  }
  return true;
}

function dedupe(errors: PointerError[]): PointerError[] {
  const seen = new Set<string>();
  return errors.filter((e) => {
    const key = `${e.pointer}\u0000${e.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
