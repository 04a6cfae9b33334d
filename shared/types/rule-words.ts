/**
 * The club rules in words: levels, ages and the place of every parameter of a rule set, so the
 * rule tables, the rule-set check's messages, the history and the "try it" compare all name a
 * number the same way ("Group sizes › Keep-ball › Beginner › Most"), never by its JSON pointer.
 * Every word is marked with `$localize`; sentences made of pieces are whole messages with
 * placeholders, so a translation may reorder them.
 */
import '../i18n/localize';
import { childAt, pointerTokens } from '../json-pointer';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS } from './activity-words';
import type { AgeGroup, Level, PlanKind } from './plan-request';
import type { AgeBand } from './plan-rules';
import { LEVEL_LABELS } from './squad-words';

/** A level in the rules: the same words as a squad's level. */
export const LEVEL_WORDS: Record<Level, string> = LEVEL_LABELS;

/** A kind of plan in the rules; a getter per kind, so each read is in the reader's language. */
export const PLAN_KIND_WORDS: Record<PlanKind, string> = {
  get 'match-warm-up'() {
    return $localize`Match warm-up`;
  },
  get training() {
    return $localize`Training session`;
  },
};

/** "U10" → "Under 10"; "adult" → "Adults". */
export function ageGroupWords(age: string): string {
  const under = /^U(\d+)$/.exec(age);
  if (under)
    return $localize`:age group in the club rules, players under this age, e.g. Under 10:Under ${under[1]}:age:`;
  return age === 'adult' ? $localize`:age group in the club rules:Adults` : age;
}

/** "U6-U8" → "Under 6 to 8"; "U15-adult" → "Under 15 to adult". */
export function ageBandWords(band: AgeBand | string): string {
  const match = /^U(\d+)-(U(\d+)|adult)$/.exec(band);
  if (!match) return band;
  return match[3] === undefined
    ? $localize`:band of age groups in the club rules, e.g. Under 15 to adult:Under ${match[1]}:youngest: to adult`
    : $localize`:band of age groups in the club rules, e.g. Under 6 to 8:Under ${match[1]}:youngest: to ${match[3]}:oldest:`;
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
  /** Called on each use (never a string made at load), so the words are in the reader's language. */
  words: (key: string, value: unknown) => string;
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
/**
 * A step with fixed words. Words are functions throughout the tables (never strings made when the
 * module loads), so the server says them in the language of the request that reads them.
 */
const leaf = (words: () => string) => step(words);
/** Words for the n-th entry of a list, counted from 1: "Row 3". */
type Numbered = (n: number) => string;
/** A row of a list: its own name when it has one, else its number ("Row 3"). */
const row = (
  numberedWords: Numbered,
  nameOf: (value: Record<string, unknown>) => unknown,
  fields: PathStep['fields'],
) =>
  step((key, value) => {
    const name = value && typeof value === 'object' ? nameOf(value as Record<string, unknown>) : undefined;
    if (typeof name === 'string' && name.trim()) return name.trim().replace(/[.:;]+$/, '');
    return /^\d+$/.test(key) ? numberedWords(Number(key) + 1) : humanise(key);
  }, fields);
const numbered = (numberedWords: Numbered, each?: PathStep) =>
  step((key) => (/^\d+$/.test(key) ? numberedWords(Number(key) + 1) : humanise(key)), undefined, each);
/** The rule set's own name, as a place in it. */
const ruleSetName = () => $localize`:club rules|the rule set's own name, as a place in the club rules:Name`;

const GROUP_SIZE = {
  min: leaf(() => $localize`:club rules|group size of an activity, the fewest players in a group:Fewest`),
  preferred: leaf(
    () => $localize`:club rules|group size of an activity, the best number of players in a group:Best`,
  ),
  max: leaf(() => $localize`:club rules|group size of an activity, the most players in a group:Most`),
};
const AREA = {
  width: leaf(() => $localize`:club rules|area of an activity, its width:Width`),
  length: leaf(() => $localize`:club rules|area of an activity, its length:Length`),
  forPlayers: leaf(
    () =>
      $localize`:club rules|area of an activity, the number of players its width and length are for:For players`,
  ),
  minWidth: leaf(() => $localize`:club rules|area of an activity, the narrowest it may be:Narrowest`),
  maxWidth: leaf(() => $localize`:club rules|area of an activity, the widest it may be:Widest`),
  step: leaf(() => $localize`:club rules|area of an activity, the step its size changes by:Step`),
};

/** The one label table: every parameter of a rule set, in the words of the rule tables. */
const PARAMETERS: Record<string, PathStep> = {
  ageGroups: step(
    () => $localize`:heading in the club rules, the activities each age group may do:Activities by age`,
    undefined,
    byCode({
      allowedKinds: leaf(() => $localize`:club rules, the activities an age group may do:Activities allowed`),
      band: leaf(() => $localize`:club rules, the band of ages an age group belongs to:Age band`),
      index: leaf(() => $localize`:club rules|the place of an age group from youngest to oldest:Order`),
    }),
  ),
  groupSizes: step(
    () => $localize`:heading in the club rules, players in a group for each activity:Group sizes`,
    undefined,
    byCode(undefined, byCode(GROUP_SIZE)),
  ),
  keepBall: step(
    () => $localize`:heading in the club rules, attackers against defenders in keep-ball:Keep-ball ratios`,
    undefined,
    byCode({
      formats: step(
        () => $localize`:club rules|the keep-ball formats such as 4v1:Formats`,
        undefined,
        numbered(
          (n) => $localize`:club rules, a keep-ball format by its number, e.g. Format 2:Format ${n}:number:`,
        ),
      ),
      maxAttackersPerDefender: leaf(() => $localize`:club rules, keep-ball:Most attackers per defender`),
    }),
  ),
  keepBallLimits: step(
    () => $localize`:heading in the club rules, the space keep-ball needs:Keep-ball room`,
    {
      minM2PerPlayer: leaf(() => $localize`:club rules, keep-ball, the area each player needs:Room a player`),
      minSideM: leaf(() => $localize`:club rules, keep-ball, the shortest side of its area:Shortest side`),
      twoDefendersFromAge: leaf(
        () =>
          $localize`:club rules, keep-ball, the age from which it has two defenders:Two defenders from age`,
      ),
    },
  ),
  areas: step(
    () => $localize`:heading in the club rules, the size of each activity’s area:Area sizes`,
    undefined,
    byCode(undefined, byCode(AREA)),
  ),
  areaLevelScale: step(
    () =>
      $localize`:heading in the club rules, how much bigger or smaller areas are for each level:Area scale by level`,
    undefined,
    byCode(),
  ),
  sessionShapes: step(
    () => $localize`:heading in the club rules, the parts a session is made of:Parts of a session`,
    undefined,
    byCode(
      undefined,
      byCode(
        undefined,
        row(
          (n) => $localize`:club rules, a part of a session by its number, e.g. Part 3:Part ${n}:number:`,
          (v) => v['name'],
          {
            share: leaf(() => $localize`:club rules|a part of a session, its share of the time:Share`),
            maxMinutes: leaf(
              () => $localize`:club rules|a part of a session, the most minutes it may last:Longest`,
            ),
            kinds: leaf(() => $localize`:club rules|the activities a part of a session may use:Activities`),
            name: leaf(() => $localize`:club rules|the name of a part of a session:Name`),
            priority: leaf(() => $localize`:club rules, a part of a session:Kept first when short of time`),
            role: leaf(() => $localize`:club rules|what a part of a session is for:Role`),
          },
        ),
      ),
    ),
  ),
  themes: step(
    () =>
      $localize`:heading in the club rules, the activities for each focus of a training session:Training themes`,
    undefined,
    byCode({
      technical: leaf(
        () => $localize`:club rules, a training theme, its unopposed activities:Technical part`,
      ),
      opposed: leaf(
        () => $localize`:club rules, a training theme, its activities with opponents:Opposed part`,
      ),
    }),
  ),
  gameFormats: step(
    () =>
      $localize`:heading in the club rules, players a side in games and whether they have goalkeepers:Games and goalkeepers`,
    undefined,
    byCode({
      maxPerSide: leaf(() => $localize`:club rules, a game, the most players on each side:Most a side`),
      minPerSide: leaf(() => $localize`:club rules, a game, the fewest players on each side:Fewest a side`),
      goalkeepers: leaf(() => $localize`:club rules|whether games have goalkeepers:Goalkeepers`),
    }),
  ),
  timing: step(() => $localize`:club rules|heading, minutes and breaks:Timing`, {
    minPhaseMinutes: leaf(
      () => $localize`:club rules, timing, the fewest minutes a part of a session lasts:Shortest part`,
    ),
    drinksEveryMinutes: leaf(
      () => $localize`:club rules, timing, followed by a number of minutes:Drinks break at least every`,
    ),
    heatDrinksEveryMinutes: leaf(
      () =>
        $localize`:club rules, timing, followed by a number of minutes:In the heat, drinks at least every`,
    ),
    drinksMinutes: leaf(() => $localize`:club rules, timing, minutes of a drinks break:Drinks break length`),
    conesPerMinute: leaf(
      () => $localize`:club rules, timing, how fast a coach sets out cones:Cones put out a minute`,
    ),
    goalMovesPerMinute: leaf(
      () => $localize`:club rules, timing, how fast a coach moves goals:Goals moved a minute`,
    ),
  }),
  kinds: step(
    () =>
      $localize`:heading in the club rules, how each kind of activity is made harder or replaced:How activities adapt`,
    undefined,
    byCode({
      harderWhenArea: leaf(
        () => $localize`:club rules, followed by smaller or larger:Harder when the area is`,
      ),
      substitutes: leaf(
        () => $localize`:club rules, the activities that may replace a kind of activity:Played instead`,
      ),
      rotatable: leaf(
        () =>
          $localize`:club rules, whether an activity’s area may be turned round on the pitch:May be turned`,
      ),
    }),
  ),
  touchRates: step(
    () =>
      $localize`:heading in the club rules, how often players touch the ball in each activity:Touch rates`,
    undefined,
    byCode({
      perMinute: leaf(
        () => $localize`:club rules, touches of the ball a player makes each minute:Touches a minute`,
      ),
      activeShare: leaf(
        () => $localize`:club rules, the share of an activity a player is in play:Share of time in play`,
      ),
      byRole: step(
        () => $localize`:club rules, touch rates for goalkeepers, defenders and servers:By role`,
        undefined,
        byCode(),
      ),
    }),
  ),
  touchTarget: step(
    () => $localize`:heading in the club rules, the touches a warm-up should give each player:Touch targets`,
    {
      active: leaf(() => $localize`:club rules, touch targets, on or off:Warn when a warm-up falls short`),
      minPerPlayer: leaf(() => $localize`:club rules, touch targets:Fewest touches per player`),
      maxPerPlayer: leaf(() => $localize`:club rules, touch targets:Most touches per player`),
      fromMinutes: leaf(
        () => $localize`:club rules, touch targets, followed by a number of minutes:For warm-ups of at least`,
      ),
    },
  ),
  cautions: step(() => $localize`:club rules|heading, weather cautions:Safety`, {
    heatC: leaf(() => $localize`:club rules, safety, followed by a temperature:Hot weather from`),
    coldC: leaf(() => $localize`:club rules, safety, followed by a temperature:Cold weather below`),
  }),
  intensity: step(() => $localize`:club rules|heading, how hard activities may be:Intensity`, {
    max: leaf(() => $localize`:club rules|the highest intensity allowed:Highest`),
  }),
  supervision: step(() => $localize`:club rules|heading, adults needed to supervise children:Adults`, {
    ratios: step(
      () =>
        $localize`:heading in the club rules, children one adult may supervise, by age:Children per adult`,
      undefined,
      row(
        (n) => $localize`:club rules, a row of a table by its number, e.g. Row 3:Row ${n}:number:`,
        (v) =>
          typeof v['upToAge'] === 'number'
            ? $localize`:club rules, a row of children per adult, named by its age, e.g. Up to age 8:Up to age ${v['upToAge']}:age:`
            : undefined,
        {
          childrenPerAdult: leaf(
            () => $localize`:club rules, children one adult may supervise:Children per adult`,
          ),
          upToAge: leaf(
            () => $localize`:club rules, the oldest age a row of children per adult is for:Up to age`,
          ),
        },
      ),
    ),
    minAdults: leaf(() => $localize`:club rules, supervision:Fewest adults at a children’s session`),
    stationsPerAdult: leaf(() => $localize`:club rules, supervision:Stations one adult can oversee`),
    source: leaf(() => $localize`:club rules|where the supervision numbers come from:Source`),
  }),
  layout: step(() => $localize`:club rules|heading, room around stations and goals on the pitch:Layout`, {
    bufferM: leaf(() => $localize`:club rules, layout, a distance:Room between stations`),
    shotClearanceM: leaf(() => $localize`:club rules, layout, a distance:Room behind goals`),
    gateWidthM: leaf(() => $localize`:club rules, layout, the width of a gate made of two cones:Gate width`),
  }),
  allocation: step(
    () => $localize`:club rules|heading, how players and coaches are put into groups:Grouping`,
    {
      coachPenalty: leaf(
        () => $localize`:club rules, grouping, a weight:Reluctance to add a coach to a group`,
      ),
      fallbackStationPenalty: leaf(
        () => $localize`:club rules, grouping, a weight:Reluctance to use a stand-in activity`,
      ),
    },
  ),
  variety: step(() => $localize`:club rules|heading, how plans avoid repeating activities:Variety`, {
    recentPenalty: leaf(() => $localize`:club rules, variety, a weight:Avoid recent activities`),
  }),
  focusBoost: step(
    () =>
      $localize`:heading in the club rules, how strongly each kind of activity follows a session’s focus:Focus weight`,
    undefined,
    byCode(),
  ),
  activities: step(
    () => $localize`:heading in the club rules, the club’s list of activities:Our activities`,
    undefined,
    row(
      (n) =>
        $localize`:club rules, an activity by its number in the list, e.g. Activity 3:Activity ${n}:number:`,
      (v) => v['title'],
      {
        id: leaf(() => $localize`:club rules|the short code that names an activity or a rule:Reference`),
        kind: leaf(() => $localize`:club rules|the kind of an activity:Kind`),
        title: leaf(() => $localize`:club rules|an activity’s title:Title`),
        summary: leaf(() => $localize`:club rules|an activity’s one-line summary:Summary`),
        description: leaf(() => $localize`:club rules, an activity’s description:What the players do`),
        coachingPoints: step(
          () => $localize`:club rules, an activity’s coaching points:Coaching points`,
          undefined,
          numbered(
            (n) => $localize`:club rules, a coaching point by its number, e.g. Point 2:Point ${n}:number:`,
          ),
        ),
        easier: step(
          () => $localize`:club rules|ways to make an activity easier:Easier`,
          undefined,
          numbered(
            (n) =>
              $localize`:club rules, a way to make an activity easier or harder, by its number, e.g. Way 2:Way ${n}:number:`,
          ),
        ),
        harder: step(
          () => $localize`:club rules|ways to make an activity harder:Harder`,
          undefined,
          numbered(
            (n) =>
              $localize`:club rules, a way to make an activity easier or harder, by its number, e.g. Way 2:Way ${n}:number:`,
          ),
        ),
        ages: step(() => $localize`:club rules|the ages an activity suits:Ages`, {
          from: leaf(() => $localize`:club rules|the youngest age group an activity suits:Youngest`),
          to: leaf(() => $localize`:club rules|the oldest age group an activity suits:Oldest`),
        }),
        levels: leaf(() => $localize`:club rules|the levels an activity suits:Levels`),
        focus: leaf(() => $localize`:club rules|what an activity works on:Focus`),
        intensity: leaf(() => $localize`:club rules|how hard an activity is, 1 to 5:Intensity`),
        balls: leaf(() => $localize`:club rules|the balls an activity needs:Balls`),
        bibs: leaf(() => $localize`:club rules|whether an activity needs bibs:Bibs`),
        layout: leaf(() => $localize`:club rules|how an activity is laid out:Set-up`),
        players: step(() => $localize`:club rules, players an activity takes:Players in a group`, {
          min: leaf(() => $localize`:club rules|the fewest players an activity takes:Fewest`),
          max: leaf(() => $localize`:club rules|the most players an activity takes:Most`),
        }),
        origin: leaf(() => $localize`:club rules, an activity the club wrote itself:Added by the club`),
        retired: leaf(() => $localize`:club rules|an activity no longer used in new plans:Retired`),
      },
    ),
  ),
};

const DOCUMENT: Record<string, PathStep> = {
  name: leaf(ruleSetName),
  id: leaf(() => $localize`:club rules|the short code that names an activity or a rule:Reference`),
  version: leaf(() => $localize`:club rules, the number of a version of the rule set:Version number`),
  rules: step(
    () => $localize`:club rules|heading, the rules that change a plan when their conditions are met:Rules`,
    undefined,
    row(
      (n) => $localize`:club rules, a rule by its number, e.g. Rule 3:Rule ${n}:number:`,
      (v) => v['description'],
      {
        id: leaf(() => $localize`:club rules|the short code that names an activity or a rule:Reference`),
        description: leaf(() => $localize`:club rules|what a rule is for:Description`),
        conditions: leaf(() => $localize`:club rules|the conditions of a rule:When`),
        event: leaf(() => $localize`:club rules, what a rule changes in a plan:What it does`),
      },
    ),
  ),
};

/**
 * The place of a pointer in a rule set, in words, one per step:
 * "/parameters/groupSizes/keep-ball/beginner/max" → ["Group sizes", "Keep-ball", "Beginner", "Most"].
 * `document` (the rule set) lets rows be named by their own name ("Arrival", an activity's title).
 */
export function rulePathParts(pointer: string, document?: unknown): string[] {
  const keys = pointerTokens(pointer);
  let node: unknown = document;
  let table: Record<string, PathStep> | undefined = DOCUMENT;
  let each: PathStep | undefined;
  const words: string[] = [];
  keys.forEach((key, i) => {
    node = childAt(node, key);
    if (i === 0 && key === 'parameters') {
      table = PARAMETERS;
      each = undefined;
      return;
    }
    const known: PathStep | undefined = table && Object.hasOwn(table, key) ? table[key] : each;
    if (!known) {
      words.push(
        /^\d+$/.test(key)
          ? $localize`:club rules, an entry of a list by its number, e.g. Item 3:Item ${Number(key) + 1}:number:`
          : codeWords(key),
      );
      table = undefined;
      each = undefined;
      return;
    }
    words.push(known.words(key, node));
    table = known.fields;
    each = known.each;
  });
  return words;
}

/** The same place as one line: "Group sizes › Keep-ball › Beginner › Most". */
export function rulePathWords(pointer: string, document?: unknown): string {
  const parts = rulePathParts(pointer, document);
  if (!parts.length)
    return $localize`:club rules, the place meant when a message is about the whole rule set:The whole rule set`;
  return parts.reduce(
    (outer, inner) =>
      $localize`:club rules, a place in the rules, a heading then what is under it, e.g. Group sizes › Keep-ball:${outer}:outer: › ${inner}:inner:`,
  );
}

/** Attackers against defenders: "4v1". */
function versusWords(attackers: unknown, defenders: unknown): string {
  return $localize`:attackers against defenders in keep-ball, e.g. 4v1:${attackers}:attackers:v${defenders}:defenders:`;
}

/** A value of the rules as a person reads it: "4v1, 3v1", "Keep-ball, Duel", "Yes", an activity's title. */
export function ruleValueWords(value: unknown): string {
  if (value === undefined || value === null) return '—';
  if (typeof value === 'boolean')
    return value
      ? $localize`:club rules, a setting that is on:Yes`
      : $localize`:club rules, a setting that is off:No`;
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string')
    return /^[a-z0-9]+(-[a-z0-9]+)*$|^U\d/.test(value) ? codeWords(value) : value;
  if (Array.isArray(value)) {
    if (value.length === 0) return $localize`:club rules, an empty list:none`;
    if (value.every((v) => v && typeof v === 'object' && 'attackers' in v && 'defenders' in v))
      return value
        .map((v: { attackers: number; defenders: number }) => versusWords(v.attackers, v.defenders))
        .join(', ');
    const words = value.map((v) => ruleValueWords(v)).join(', ');
    return words.length > 120 ? `${words.slice(0, 117)}…` : words;
  }
  const named = value as Record<string, unknown>;
  if (typeof named['attackers'] === 'number' && typeof named['defenders'] === 'number')
    return versusWords(named['attackers'], named['defenders']);
  for (const key of ['title', 'description', 'name'])
    if (typeof named[key] === 'string' && named[key])
      return $localize`:club rules, a title or name written in quotation marks:“${named[key] as string}:name:”`;
  return $localize`:club rules, a value made of several settings:a group of settings`;
}

/** One change in words: "Group sizes › Keep-ball › Beginner › Most: 6 → 5". */
export function ruleChangeWords(
  change: { path: string; change: 'added' | 'removed' | 'changed'; before?: unknown; after?: unknown },
  document?: unknown,
): string {
  const place = change.path === '(name)' ? ruleSetName() : rulePathWords(change.path, document);
  if (change.change === 'added') {
    const value = ruleValueWords(change.after);
    return $localize`:a change to the club rules, the place and the value added:${place}:place:: added ${value}:value:`;
  }
  if (change.change === 'removed') {
    const value = ruleValueWords(change.before);
    return $localize`:a change to the club rules, the place and the value removed:${place}:place:: removed (was ${value}:value:)`;
  }
  const before = ruleValueWords(change.before);
  const after = ruleValueWords(change.after);
  return $localize`:a change to the club rules, the place, the value before and after:${place}:place:: ${before}:before: → ${after}:after:`;
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
  if (!rules) return $localize`:the rules a plan was made with, when they are not known:Club rules`;
  if (rules.builtIn) return $localize`:the rules a plan was made with:Club rules: Conewise’s starting rules`;
  const name = rules.name;
  if (!rules.publishedAt) {
    if (rules.status === 'draft')
      return $localize`:the rules a plan was made with, a draft:Club rules: ${name}:rulesName: (a draft)`;
    if (rules.status === 'archived')
      return $localize`:the rules a plan was made with, replaced since:Club rules: ${name}:rulesName: (an earlier version)`;
    return $localize`:the rules a plan was made with:Club rules: ${name}:rulesName:`;
  }
  const date = new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short' }).format(
    new Date(rules.publishedAt),
  );
  if (rules.status === 'draft')
    return $localize`:the rules a plan was made with, a draft, and the day they were published, e.g. 3 Dec:Club rules: ${name}:rulesName:, published ${date}:date: (a draft)`;
  if (rules.status === 'archived')
    return $localize`:the rules a plan was made with, replaced since, and the day they were published, e.g. 3 Dec:Club rules: ${name}:rulesName:, published ${date}:date: (an earlier version)`;
  return $localize`:the rules a plan was made with and the day they were published, e.g. 3 Dec:Club rules: ${name}:rulesName:, published ${date}:date:`;
}
