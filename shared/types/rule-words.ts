/**
 * The club rules in words: levels, ages and the place of every parameter of a rule set, so the
 * rule tables, the rule-set check's messages, the history and the "try it" compare all name a
 * number the same way ("Group sizes › Keep-ball › Beginner › Most"), never by its JSON pointer.
 */
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS } from './activity-words';
import type { AgeGroup, Level, PlanKind } from './plan-request';
import type { AgeBand } from './plan-rules';

export const LEVEL_WORDS: Record<Level, string> = {
  beginner: 'Beginner',
  intermediate: 'Intermediate',
  advanced: 'Advanced',
};

export const PLAN_KIND_WORDS: Record<PlanKind, string> = {
  'match-warm-up': 'Match warm-up',
  training: 'Training session',
};

/** "U10" → "Under 10"; "adult" → "Adults". */
export function ageGroupWords(age: string): string {
  const under = /^U(\d+)$/.exec(age);
  if (under) return `Under ${under[1]}`;
  return age === 'adult' ? 'Adults' : age;
}

/** "U6-U8" → "Under 6 to 8"; "U15-adult" → "Under 15 to adult". */
export function ageBandWords(band: AgeBand | string): string {
  const match = /^U(\d+)-(U(\d+)|adult)$/.exec(band);
  if (!match) return band;
  return `Under ${match[1]} to ${match[3] ?? 'adult'}`;
}

/** Words for a rule set's codes wherever one may stand as a key or a value: a kind, a level, an age. */
export function codeWords(key: string): string {
  if (Object.hasOwn(LEVEL_WORDS, key)) return LEVEL_WORDS[key as Level];
  if (Object.hasOwn(ACTIVITY_KIND_LABELS, key))
    return ACTIVITY_KIND_LABELS[key as keyof typeof ACTIVITY_KIND_LABELS];
  if (Object.hasOwn(PLAN_KIND_WORDS, key)) return PLAN_KIND_WORDS[key as PlanKind];
  if (/^U\d+-(U\d+|adult)$/.test(key)) return ageBandWords(key);
  if (/^U\d+$/.test(key) || key === 'adult') return ageGroupWords(key as AgeGroup);
  if (Object.hasOwn(FOCUS_LABELS, key)) return FOCUS_LABELS[key as keyof typeof FOCUS_LABELS];
  return humanise(key);
}

/** "maxPerSide" → "Max per side", "keep-ball" → "Keep ball": the fallback for a key the table lacks. */
function humanise(key: string): string {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/[-_]+/g, ' ')
    .trim()
    .toLowerCase();
  return words ? words[0].toUpperCase() + words.slice(1) : key;
}

/** One step of a path: fixed words, or words made from the key and the value found there. */
interface PathStep {
  words: string | ((key: string, value: unknown) => string);
  /** Named keys below this step. */
  fields?: Record<string, PathStep>;
  /** Any key (a kind, a level, a row) below this step. */
  each?: PathStep;
}

const step = (words: PathStep['words'], fields?: PathStep['fields'], each?: PathStep): PathStep => ({
  words,
  ...(fields ? { fields } : {}),
  ...(each ? { each } : {}),
});
const byCode = (fields?: PathStep['fields'], each?: PathStep) => step(codeWords, fields, each);
const leaf = (words: string) => step(words);
/** A row of a list: its own name when it has one, else "Row 3". */
const row = (noun: string, nameOf: (value: Record<string, unknown>) => unknown, fields: PathStep['fields']) =>
  step((key, value) => {
    const name = value && typeof value === 'object' ? nameOf(value as Record<string, unknown>) : undefined;
    if (typeof name === 'string' && name.trim()) return name.trim().replace(/[.:;]+$/, '');
    return /^\d+$/.test(key) ? `${noun} ${Number(key) + 1}` : humanise(key);
  }, fields);
const numbered = (noun: string, each?: PathStep) =>
  step((key) => (/^\d+$/.test(key) ? `${noun} ${Number(key) + 1}` : humanise(key)), undefined, each);

const GROUP_SIZE = { min: leaf('Fewest'), preferred: leaf('Best'), max: leaf('Most') };
const AREA = {
  width: leaf('Width'),
  length: leaf('Length'),
  forPlayers: leaf('For players'),
  minWidth: leaf('Narrowest'),
  maxWidth: leaf('Widest'),
  step: leaf('Step'),
};

/** The one label table: every parameter of a rule set, in the words of the rule tables. */
const PARAMETERS: Record<string, PathStep> = {
  ageGroups: step(
    'Activities by age',
    undefined,
    byCode({ allowedKinds: leaf('Activities allowed'), band: leaf('Age band'), index: leaf('Order') }),
  ),
  groupSizes: step('Group sizes', undefined, byCode(undefined, byCode(GROUP_SIZE))),
  keepBall: step(
    'Keep-ball ratios',
    undefined,
    byCode({
      formats: step('Formats', undefined, numbered('Format')),
      maxAttackersPerDefender: leaf('Most attackers per defender'),
    }),
  ),
  keepBallLimits: step('Keep-ball room', {
    minM2PerPlayer: leaf('Room a player'),
    minSideM: leaf('Shortest side'),
    twoDefendersFromAge: leaf('Two defenders from age'),
  }),
  areas: step('Area sizes', undefined, byCode(undefined, byCode(AREA))),
  areaLevelScale: step('Area scale by level', undefined, byCode()),
  sessionShapes: step(
    'Parts of a session',
    undefined,
    byCode(
      undefined,
      byCode(
        undefined,
        row('Part', (v) => v['name'], {
          share: leaf('Share'),
          maxMinutes: leaf('Longest'),
          kinds: leaf('Activities'),
          name: leaf('Name'),
          priority: leaf('Kept first when short of time'),
          role: leaf('Role'),
        }),
      ),
    ),
  ),
  themes: step(
    'Training themes',
    undefined,
    byCode({ technical: leaf('Technical part'), opposed: leaf('Opposed part') }),
  ),
  gameFormats: step(
    'Games and goalkeepers',
    undefined,
    byCode({
      maxPerSide: leaf('Most a side'),
      minPerSide: leaf('Fewest a side'),
      goalkeepers: leaf('Goalkeepers'),
    }),
  ),
  timing: step('Timing', {
    minPhaseMinutes: leaf('Shortest part'),
    drinksEveryMinutes: leaf('Drinks break at least every'),
    heatDrinksEveryMinutes: leaf('In the heat, drinks at least every'),
    drinksMinutes: leaf('Drinks break length'),
    conesPerMinute: leaf('Cones put out a minute'),
    goalMovesPerMinute: leaf('Goals moved a minute'),
  }),
  kinds: step(
    'How activities adapt',
    undefined,
    byCode({
      harderWhenArea: leaf('Harder when the area is'),
      substitutes: leaf('Played instead'),
      rotatable: leaf('May be turned'),
    }),
  ),
  touchRates: step(
    'Touch rates',
    undefined,
    byCode({
      perMinute: leaf('Touches a minute'),
      activeShare: leaf('Share of time in play'),
      byRole: step('By role', undefined, byCode()),
    }),
  ),
  touchTarget: step('Touch targets', {
    active: leaf('Warn when a warm-up falls short'),
    minPerPlayer: leaf('Fewest touches per player'),
    maxPerPlayer: leaf('Most touches per player'),
    fromMinutes: leaf('For warm-ups of at least'),
  }),
  cautions: step('Safety', { heatC: leaf('Hot weather from'), coldC: leaf('Cold weather below') }),
  intensity: step('Intensity', { max: leaf('Highest') }),
  supervision: step('Adults', {
    ratios: step(
      'Children per adult',
      undefined,
      row('Row', (v) => (typeof v['upToAge'] === 'number' ? `Up to age ${v['upToAge']}` : undefined), {
        childrenPerAdult: leaf('Children per adult'),
        upToAge: leaf('Up to age'),
      }),
    ),
    minAdults: leaf('Fewest adults at a children’s session'),
    stationsPerAdult: leaf('Stations one adult can oversee'),
    source: leaf('Source'),
  }),
  layout: step('Layout', {
    bufferM: leaf('Room between stations'),
    shotClearanceM: leaf('Room behind goals'),
    gateWidthM: leaf('Gate width'),
  }),
  allocation: step('Grouping', {
    coachPenalty: leaf('Reluctance to add a coach to a group'),
    fallbackStationPenalty: leaf('Reluctance to use a stand-in activity'),
  }),
  variety: step('Variety', { recentPenalty: leaf('Avoid recent activities') }),
  focusBoost: step('Focus weight', undefined, byCode()),
  activities: step(
    'Our activities',
    undefined,
    row('Activity', (v) => v['title'], {
      id: leaf('Reference'),
      kind: leaf('Kind'),
      title: leaf('Title'),
      summary: leaf('Summary'),
      description: leaf('What the players do'),
      coachingPoints: step('Coaching points', undefined, numbered('Point')),
      easier: step('Easier', undefined, numbered('Way')),
      harder: step('Harder', undefined, numbered('Way')),
      ages: step('Ages', { from: leaf('Youngest'), to: leaf('Oldest') }),
      levels: leaf('Levels'),
      focus: leaf('Focus'),
      intensity: leaf('Intensity'),
      balls: leaf('Balls'),
      bibs: leaf('Bibs'),
      layout: leaf('Set-up'),
      players: step('Players in a group', { min: leaf('Fewest'), max: leaf('Most') }),
      origin: leaf('Added by the club'),
      retired: leaf('Retired'),
    }),
  ),
};

const DOCUMENT: Record<string, PathStep> = {
  name: leaf('Name'),
  id: leaf('Reference'),
  version: leaf('Version number'),
  rules: step(
    'Rules',
    undefined,
    row('Rule', (v) => v['description'], {
      id: leaf('Reference'),
      description: leaf('Description'),
      conditions: leaf('When'),
      event: leaf('What it does'),
    }),
  ),
};

/** The keys of an RFC 6901 pointer. */
function tokens(pointer: string): string[] {
  if (pointer === '' || pointer === '/') return [];
  return pointer
    .replace(/^\//, '')
    .split('/')
    .map((t) => t.replace(/~1/g, '/').replace(/~0/g, '~'));
}

/** The value under `key` of a list or object; in a list of rows with ids, the row with that id. */
function child(node: unknown, key: string): unknown {
  if (Array.isArray(node)) {
    if (/^\d+$/.test(key)) return node[Number(key)];
    return node.find((item) => item && typeof item === 'object' && (item as { id?: unknown }).id === key);
  }
  return node && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
}

/**
 * The place of a pointer in a rule set, in words, one per step:
 * "/parameters/groupSizes/keep-ball/beginner/max" → ["Group sizes", "Keep-ball", "Beginner", "Most"].
 * `document` (the rule set) lets rows be named by their own name ("Arrival", an activity's title).
 */
export function rulePathParts(pointer: string, document?: unknown): string[] {
  const keys = tokens(pointer);
  let node: unknown = document;
  let table: Record<string, PathStep> | undefined = DOCUMENT;
  let each: PathStep | undefined;
  const words: string[] = [];
  keys.forEach((key, i) => {
    node = child(node, key);
    if (i === 0 && key === 'parameters') {
      table = PARAMETERS;
      each = undefined;
      return;
    }
    const known: PathStep | undefined = table && Object.hasOwn(table, key) ? table[key] : each;
    if (!known) {
      words.push(/^\d+$/.test(key) ? `Item ${Number(key) + 1}` : codeWords(key));
      table = undefined;
      each = undefined;
      return;
    }
    words.push(typeof known.words === 'string' ? known.words : known.words(key, node));
    table = known.fields;
    each = known.each;
  });
  return words;
}

/** The same place as one line: "Group sizes › Keep-ball › Beginner › Most". */
export function rulePathWords(pointer: string, document?: unknown): string {
  const parts = rulePathParts(pointer, document);
  return parts.length ? parts.join(' › ') : 'The whole rule set';
}

/** A value of the rules as a person reads it: "4v1, 3v1", "Keep-ball, Duel", "Yes", an activity's title. */
export function ruleValueWords(value: unknown): string {
  if (value === undefined || value === null) return '—';
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string')
    return /^[a-z0-9]+(-[a-z0-9]+)*$|^U\d/.test(value) ? codeWords(value) : value;
  if (Array.isArray(value)) {
    if (value.length === 0) return 'none';
    if (value.every((v) => v && typeof v === 'object' && 'attackers' in v && 'defenders' in v))
      return value
        .map((v: { attackers: number; defenders: number }) => `${v.attackers}v${v.defenders}`)
        .join(', ');
    const words = value.map((v) => ruleValueWords(v)).join(', ');
    return words.length > 120 ? `${words.slice(0, 117)}…` : words;
  }
  const named = value as Record<string, unknown>;
  if (typeof named['attackers'] === 'number' && typeof named['defenders'] === 'number')
    return `${named['attackers']}v${named['defenders']}`;
  for (const key of ['title', 'description', 'name'])
    if (typeof named[key] === 'string' && named[key]) return `“${named[key] as string}”`;
  return 'a group of settings';
}

/** One change in words: "Group sizes › Keep-ball › Beginner › Most: 6 → 5". */
export function ruleChangeWords(
  change: { path: string; change: 'added' | 'removed' | 'changed'; before?: unknown; after?: unknown },
  document?: unknown,
): string {
  const place = change.path === '(name)' ? 'Name' : rulePathWords(change.path, document);
  if (change.change === 'added') return `${place}: added ${ruleValueWords(change.after)}`;
  if (change.change === 'removed') return `${place}: removed (was ${ruleValueWords(change.before)})`;
  return `${place}: ${ruleValueWords(change.before)} → ${ruleValueWords(change.after)}`;
}

/** What "Club rules: …" needs to know of a version (RuleSetSummaryDto has it). */
export interface RulesNamed {
  name: string;
  status: string;
  publishedAt: string | null;
  builtIn: boolean;
}

/**
 * "Club rules: Fernmoor rules, published 3 Dec": the rules a plan was made with, as the plan page
 * and the printed card say it (the date in the reader's locale).
 */
export function rulesInWords(rules: RulesNamed | null, locale?: string): string {
  if (!rules) return 'Club rules';
  if (rules.builtIn) return 'Club rules: Conewise’s starting rules';
  const when = rules.publishedAt
    ? `, published ${new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short' }).format(new Date(rules.publishedAt))}`
    : '';
  const state =
    rules.status === 'draft' ? ' (a draft)' : rules.status === 'archived' ? ' (an earlier version)' : '';
  return `Club rules: ${rules.name}${when}${state}`;
}
