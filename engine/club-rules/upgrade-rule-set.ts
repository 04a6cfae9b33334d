/**
 * Brings a club rule set written for the first six activity kinds (parameters with
 * `phaseTemplates`, kind `pairs`) up to the current format: the current defaults, with the
 * club's own tuning carried over wherever it still has a place (group sizes, areas and area
 * direction of the kinds that remain, keep-ball formats, touch targets, thresholds, layout,
 * the club's own rules and activities). `pairs` becomes `passing-pattern`. A document already
 * in the current format comes back unchanged.
 */
import type {
  ActivityDefinition,
  AgeGroup,
  ClubRule,
  RuleParameters,
  RuleSetDocument,
  StationKind,
} from '../../shared/types';
import { STATION_KINDS } from '../../shared/types';
import { defaultRuleSet } from '../rule-sets';
// The first format's default tables, to tell a club's own tuning from values it never touched.
import FIRST from './first-format-defaults.json';
import { validateRuleSet } from '../schema/validate-rule-set';

type Loose = Record<string, unknown>;

const RENAMED: Record<string, StationKind> = { pairs: 'passing-pattern' };

/** Kinds of the first format that mean the same now (pairs became a wider passing kind). */
const KEPT_KINDS = ['ball-mastery', 'passing-finishing', 'keep-ball', 'small-sided-game', 'movement-prep'];

function at(root: unknown, path: string[]): unknown {
  let node = root;
  for (const key of path) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Loose)[key];
  }
  return node;
}

function set(root: Loose, path: string[], value: unknown): void {
  let node = root;
  for (const key of path.slice(0, -1)) node = node[key] as Loose;
  node[path[path.length - 1]] = value;
}

function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/** Whether a document is in the first format (and needs `upgradeRuleSet`). */
export function isFirstFormat(doc: unknown): boolean {
  const params = (doc as Loose | null)?.['parameters'] as Loose | undefined;
  return !!params && 'phaseTemplates' in params;
}

export function upgradeRuleSet(doc: RuleSetDocument | Loose): RuleSetDocument {
  if (!isFirstFormat(doc)) return doc as RuleSetDocument;
  const old = doc as Loose;
  const oldParams = old['parameters'] as Loose;
  const base = structuredClone(defaultRuleSet);
  const params = base.parameters as unknown as Loose;
  const kindOf = (k: string): StationKind | null => {
    const mapped = RENAMED[k] ?? k;
    return (STATION_KINDS as readonly string[]).includes(mapped) ? (mapped as StationKind) : null;
  };
  // The club's numbers where they differ from the first defaults, for kinds that kept their meaning.
  const first = FIRST as unknown as Loose;
  const changed = (path: string[]): unknown => {
    const mine = at(oldParams, path);
    return mine !== undefined && !same(mine, at(first, path)) ? mine : undefined;
  };
  for (const kind of KEPT_KINDS) {
    for (const level of ['beginner', 'intermediate', 'advanced']) {
      const v = changed(['groupSizes', kind, level]);
      if (v !== undefined) set(params, ['groupSizes', kind, level], v);
    }
    for (const band of Object.keys(at(first, ['areas', kind]) as Loose)) {
      const v = changed(['areas', kind, band]);
      if (v !== undefined) set(params, ['areas', kind, band], v);
    }
    for (const field of ['perMinute', 'activeShare']) {
      const v = changed(['touchRates', kind, field]);
      if (v !== undefined) set(params, ['touchRates', kind, field], v);
    }
    const boost = changed(['focusBoost', kind]);
    if (boost !== undefined) set(params, ['focusBoost', kind], boost);
    for (const field of ['harderWhenArea', 'rotatable']) {
      const v = changed(['kinds', kind, field]);
      if (v !== undefined) set(params, ['kinds', kind, field], v);
    }
  }
  for (const key of [
    'keepBall',
    'areaLevelScale',
    'touchTarget',
    'cautions',
    'layout',
    'allocation',
  ] as const) {
    const v = changed([key]);
    if (v !== undefined) params[key] = v;
  }
  const minPhase = changed(['timing', 'minPhaseMinutes']);
  if (minPhase !== undefined) set(params, ['timing', 'minPhaseMinutes'], minPhase);
  // A kind the club had taken away from an age stays away.
  const oldAges = (oldParams['ageGroups'] as Record<string, { allowedKinds: string[] }>) ?? {};
  const ages = params['ageGroups'] as RuleParameters['ageGroups'];
  const firstKinds = [
    'ball-mastery',
    'passing-finishing',
    'keep-ball',
    'pairs',
    'small-sided-game',
    'movement-prep',
  ];
  for (const [age, group] of Object.entries(ages) as [AgeGroup, RuleParameters['ageGroups'][AgeGroup]][]) {
    const had = oldAges[age]?.allowedKinds;
    if (!had) continue;
    const removed = firstKinds.filter((k) => !had.includes(k)).map(kindOf);
    group.allowedKinds = group.allowedKinds.filter((k) => !removed.includes(k as StationKind));
  }
  // The club's own activities and rules (those not in the first default), in the new shapes.
  const defaults = new Set(FIRST.activityIds);
  const own = ((oldParams['activities'] as Loose[]) ?? []).filter((a) => !defaults.has(String(a['id'])));
  for (const a of own) {
    const kind = kindOf(String(a['kind']));
    if (!kind) continue;
    base.parameters.activities.push(clubActivity(a, kind, base.parameters));
  }
  const firstRuleIds = new Set(FIRST_DEFAULT_RULE_IDS);
  for (const rule of (old['rules'] as ClubRule[]) ?? []) {
    if (firstRuleIds.has(rule.id) || base.rules.some((r) => r.id === rule.id)) continue;
    base.rules.push(renameKinds(rule));
  }
  const upgraded: RuleSetDocument = {
    ...base,
    id: String(old['id'] ?? base.id),
    version: Number(old['version'] ?? base.version),
    name: String(old['name'] ?? base.name),
  };
  if (validateRuleSet(upgraded).ok) return upgraded;
  // Something the club wrote has no place now: keep their numbers, drop their extra rules.
  const safer = {
    ...upgraded,
    rules: base.rules.filter((r) => defaultRuleSet.rules.some((d) => d.id === r.id)),
  };
  return validateRuleSet(safer).ok
    ? safer
    : { ...structuredClone(defaultRuleSet), id: upgraded.id, version: upgraded.version, name: upgraded.name };
}

function clubActivity(a: Loose, kind: StationKind, params: RuleParameters): ActivityDefinition {
  const description = String(a['description'] ?? a['title'] ?? '');
  const sizes = params.groupSizes[kind].intermediate;
  const focus = ((a['focus'] as string[]) ?? []).filter((f) =>
    ['passing', 'pressing', 'finishing', 'dribbling'].includes(f),
  );
  return {
    id: String(a['id']),
    kind,
    title: String(a['title'] ?? a['id']),
    summary: description.split(/(?<=\.)\s/)[0].slice(0, 140),
    description,
    coachingPoints: ((a['coachingPoints'] as string[]) ?? []).length
      ? (a['coachingPoints'] as string[])
      : [description.slice(0, 160)],
    easier: [],
    harder: [],
    ages: kind === 'movement-prep' ? { from: 'U13', to: 'adult' } : { from: 'U6', to: 'adult' },
    levels: ['beginner', 'intermediate', 'advanced'],
    focus: focus as ActivityDefinition['focus'],
    intensity: Number(a['intensity'] ?? 3),
    balls: kind === 'ball-mastery' ? 'each' : kind === 'movement-prep' ? 'none' : 'group',
    players: { min: sizes.min, max: sizes.max },
    origin: 'club',
  };
}

function renameKinds(rule: ClubRule): ClubRule {
  const text = JSON.stringify(rule)
    .replace(/"pairs"/g, '"passing-pattern"')
    .replace(/feedback:pairs/g, 'feedback:passing-pattern');
  return JSON.parse(text) as ClubRule;
}

/** The first default rule set's rule ids: those rules are replaced by the current defaults. */
const FIRST_DEFAULT_RULE_IDS = [
  'age.no-movement-prep-u12',
  'age.movement-prep-u13-match',
  'training.ends-in-game',
  'numbers.too-few-for-keep-ball',
  'numbers.too-few-for-game',
  'kit.no-goals',
  'kit.no-target',
  'kit.no-balls',
  'kit.few-balls',
  'kit.no-cones',
  'space.tiny',
  'minutes.short',
  'players.large-squad',
  'match.touch-target',
  'focus.pressing',
  'focus.finishing',
  'focus.passing',
  'focus.dribbling',
  'heat.caution',
  'heat.shorter-game',
  'cold.keep-moving',
  'heading.none-u11',
  'heading.limited-u12-u13',
  'goals.anchor',
  'standing.coach-judges',
  ...['keep-ball', 'ball-mastery', 'passing-finishing', 'small-sided-game', 'pairs'].flatMap((k) =>
    ['too-easy', 'too-hard', 'right'].map((v) => `feedback.${k}.${v}`),
  ),
];
