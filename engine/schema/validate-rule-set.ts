/**
 * Refuses a bad rule set: each problem carries the JSON pointer of the value at fault (so the
 * screens can mark that cell) and a sentence in a head of coaching's words that names the place
 * the way the rule tables do. First the JSON Schema, then checks a schema cannot express (unique
 * ids, sizes in order, keep-ball never 5v1 or worse, every kind playable).
 */
import type { ErrorObject, ValidateFunction } from 'ajv';
import {
  AGE_GROUPS,
  LEVELS,
  STATION_KINDS,
  type RuleSetDocument,
  type StationKind,
} from '../../shared/types';
import { ACTIVITY_KIND_LABELS } from '../../shared/types/activity-words';
import {
  ageGroupWords,
  codeWords,
  LEVEL_WORDS,
  rulePathParts,
  rulePathWords,
} from '../../shared/types/rule-words';
import { DEFAULT_UNITS, measureSymbol, ruleSetMeasureAt } from '../../shared/units';
import { keepBallRatio, keepsKeepBallRatio } from '../kinds/keep-ball';
import { kindLayouts } from '../kinds/registry';
// Precompiled from shared/schemas/rule-set.schema.json: no eval, so it runs under the app's CSP.
import generated from './generated/rule-set.validator';

export interface PointerError {
  pointer: string;
  message: string;
  /** Set when the club would have no activity of this kind in use (what the screens check, not the words). */
  missingKind?: StationKind;
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
        .map((e) => describe(e, value)),
    );
    return { ok: false, errors };
  }
  const errors = semanticErrors(value as RuleSetDocument);
  return { ok: errors.length === 0, errors };
}

/** "Group sizes › Keep-ball › Beginner › Fewest: must be at least 1." */
const at = (pointer: string, doc: unknown, problem: string): PointerError => ({
  pointer,
  message: `${rulePathWords(pointer, doc)}: ${problem}.`,
});

/** A code the schema allows, in words where the rule tables have words for it. */
function allowedWords(values: unknown[]): string {
  return values.map((v) => (typeof v === 'string' ? codeWords(v) : String(v))).join(', ');
}

const TYPE_WORDS: Record<string, string> = {
  integer: 'must be a whole number',
  number: 'must be a number',
  string: 'must be words',
  boolean: 'must be yes or no',
  array: 'must be a list',
  object: 'must be a group of settings',
};

/** A schema limit with its metric unit where the place measures something ("45 °C"), so screens can convert it. */
function limitWords(pointer: string, limit: unknown): string {
  const measure = ruleSetMeasureAt(pointer);
  return measure ? `${String(limit)} ${measureSymbol(measure, DEFAULT_UNITS)}` : String(limit);
}

function describe(e: ErrorObject, doc: unknown): PointerError {
  const p = e.params as Record<string, unknown>;
  const pointer = e.instancePath || '';
  const propertyName = (e as ErrorObject & { propertyName?: string }).propertyName;
  if (propertyName !== undefined)
    return at(`${pointer}/${propertyName}`, doc, 'is not a setting Conewise knows here');
  switch (e.keyword) {
    case 'required':
      return at(`${pointer}/${String(p['missingProperty'])}`, doc, 'is missing');
    case 'additionalProperties':
      return at(`${pointer}/${String(p['additionalProperty'])}`, doc, 'is not a setting Conewise knows here');
    case 'enum':
      return at(pointer, doc, `must be one of ${allowedWords(p['allowedValues'] as unknown[])}`);
    case 'type':
      return at(pointer, doc, TYPE_WORDS[String(p['type'])] ?? 'is the wrong kind of value');
    case 'minimum':
      return at(pointer, doc, `must be at least ${limitWords(pointer, p['limit'])}`);
    case 'maximum':
      return at(pointer, doc, `must be at most ${limitWords(pointer, p['limit'])}`);
    case 'exclusiveMinimum':
      return at(pointer, doc, `must be more than ${limitWords(pointer, p['limit'])}`);
    case 'exclusiveMaximum':
      return at(pointer, doc, `must be less than ${limitWords(pointer, p['limit'])}`);
    case 'minItems':
      return at(
        pointer,
        doc,
        Number(p['limit']) === 1
          ? 'needs at least one entry'
          : `needs at least ${String(p['limit'])} entries`,
      );
    case 'maxItems':
      return at(pointer, doc, `can have at most ${String(p['limit'])} entries`);
    case 'minLength':
      return at(
        pointer,
        doc,
        Number(p['limit']) === 1 ? 'cannot be empty' : `needs at least ${String(p['limit'])} characters`,
      );
    case 'maxLength':
      return at(pointer, doc, `can have at most ${String(p['limit'])} characters`);
    case 'pattern':
      return at(pointer, doc, 'has characters that are not allowed here');
    case 'uniqueItems':
      return at(pointer, doc, 'lists the same thing twice');
    default:
      return at(pointer, doc, 'is not right');
  }
}

/** "Keep-ball, Beginner": a cell's row and column, without the table's name or the field's. */
function rowWords(pointer: string, doc: unknown): string {
  return rulePathParts(pointer, doc).slice(1).join(', ');
}

function semanticErrors(doc: RuleSetDocument): PointerError[] {
  const errors: PointerError[] = [];
  const params = doc.parameters;

  const ruleIds = new Map<string, number>();
  doc.rules.forEach((rule, i) => {
    const first = ruleIds.get(rule.id);
    if (first !== undefined)
      errors.push(
        at(
          `/rules/${i}/id`,
          doc,
          `is the same as that of “${rulePathParts(`/rules/${first}`, doc).at(-1)}”; each rule needs its own`,
        ),
      );
    else ruleIds.set(rule.id, i);
  });

  const activityIds = new Map<string, number>();
  params.activities.forEach((a, i) => {
    const first = activityIds.get(a.id);
    if (first !== undefined)
      errors.push(
        at(
          `/parameters/activities/${i}/id`,
          doc,
          `is the same as that of “${params.activities[first].title}”; each activity needs its own`,
        ),
      );
    else activityIds.set(a.id, i);
  });
  for (const kind of STATION_KINDS) {
    if (!params.activities.some((a) => a.kind === kind && !a.retired)) {
      errors.push({
        pointer: '/parameters/activities',
        message: `Our activities: at least one ${ACTIVITY_KIND_LABELS[kind]} activity must be in use; bring one back or add one.`,
        missingKind: kind,
      });
    }
  }
  params.activities.forEach((a, i) => {
    const where = `/parameters/activities/${i}`;
    const layouts = kindLayouts(a.kind);
    if (a.layout !== undefined && !layouts.some((l) => l.id === a.layout)) {
      errors.push({
        pointer: `${where}/layout`,
        message: `${a.title}: the set-up must be one of ${layouts.map((l) => l.label).join(', ')} for ${ACTIVITY_KIND_LABELS[a.kind]}.`,
      });
    }
    if (AGE_GROUPS.indexOf(a.ages.from) > AGE_GROUPS.indexOf(a.ages.to)) {
      errors.push({
        pointer: `${where}/ages/to`,
        message: `${a.title}: the oldest age (${ageGroupWords(a.ages.to)}) is below the youngest (${ageGroupWords(a.ages.from)}).`,
      });
    }
    if (a.players.min > a.players.max) {
      errors.push({
        pointer: `${where}/players/max`,
        message: `${a.title}: the most players in a group (${a.players.max}) is below the fewest (${a.players.min}).`,
      });
    }
  });

  for (const kind of STATION_KINDS) {
    for (const level of LEVELS) {
      const g = params.groupSizes[kind][level];
      const base = `/parameters/groupSizes/${kind}/${level}`;
      const row = rowWords(base, doc);
      if (g.max < g.min) {
        errors.push({
          pointer: `${base}/max`,
          message: `${row}: the most players in a group (${g.max}) is below the fewest (${g.min}).`,
        });
      } else if (g.preferred < g.min) {
        errors.push({
          pointer: `${base}/preferred`,
          message: `${row}: the best group size (${g.preferred}) is below the fewest (${g.min}).`,
        });
      } else if (g.preferred > g.max) {
        errors.push({
          pointer: `${base}/preferred`,
          message: `${row}: the best group size (${g.preferred}) is above the most (${g.max}).`,
        });
      }
    }
    for (const [band, a] of Object.entries(params.areas[kind])) {
      if (a.minWidth > a.maxWidth) {
        const base = `/parameters/areas/${kind}/${band}`;
        errors.push({
          pointer: `${base}/maxWidth`,
          message: `${rowWords(base, doc)}: the widest area (${a.maxWidth} m) is below the narrowest (${a.minWidth} m).`,
        });
      }
    }
  }

  for (const level of LEVELS) {
    const { min, max } = keepBallRatio(params, level);
    params.keepBall[level].formats.forEach((f, i) => {
      if (!keepsKeepBallRatio(params, level, f.attackers, f.defenders)) {
        errors.push({
          pointer: `/parameters/keepBall/${level}/formats/${i}`,
          message:
            f.attackers / f.defenders < min
              ? `Keep-ball, ${LEVEL_WORDS[level]}: ${f.attackers}v${f.defenders} has fewer than ${min} attackers per defender.`
              : `Keep-ball, ${LEVEL_WORDS[level]}: ${f.attackers}v${f.defenders} has more than ${max} attackers per defender.`,
        });
      }
    });
  }

  doc.rules.forEach((rule, i) => {
    const event = rule.event;
    if (event.type === 'forbid-activity') {
      if (!event.params.kind && !event.params.activityId) {
        errors.push(
          at(
            `/rules/${i}/event/params`,
            doc,
            'names neither a kind of activity nor an activity to leave out',
          ),
        );
      }
      if (event.params.activityId && !activityIds.has(event.params.activityId)) {
        errors.push(
          at(`/rules/${i}/event/params/activityId`, doc, 'names an activity this rule set does not have'),
        );
      }
    }
    if (event.type === 'set-parameter' && !hasPath(params, event.params.path)) {
      errors.push(at(`/rules/${i}/event/params/path`, doc, 'changes a setting this rule set does not have'));
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
