/**
 * The club activity form's model: the form's values as an activity of the rule set, a new
 * activity's id, and every message for the form's fields in a coach's words: simple
 * required/length checks with the rule-set schema's own limits, then the engine's check of the
 * whole draft with the activity in place, its JSON pointers mapped back to the fields.
 */
import { validateRuleSet } from '../../../core/engine/engine-adapter';
import ruleSetSchema from '../../../../../shared/schemas/rule-set.schema.json';
import type {
  ActivityDefinition,
  AgeGroup,
  BallUse,
  Focus,
  Level,
  StationKind,
} from '../../../../../shared/types';
import { setAt } from '../../../../../shared/json-pointer';

/** What the form holds: an activity's fields as the lead edits them (numbers may be blank). */
export interface ActivityFormValue {
  title: string;
  summary: string;
  description: string;
  kind: StationKind;
  layout: string;
  ages: { from: AgeGroup; to: AgeGroup };
  levels: Level[];
  focus: Focus[];
  intensity: number;
  balls: BallUse;
  bibs: boolean;
  players: { min: number | null; max: number | null };
  coachingPoints: string[];
  easier: string[];
  harder: string[];
}

/** Field messages keyed by the form's paths: "title", "players.max", "coachingPoints.2", "form". */
export type FieldMessages = Record<string, string>;

const LIMITS = ruleSetSchema.definitions.activity.properties;
/** The schema's limits, for the form's counters and its own checks. */
export const ACTIVITY_LIMITS = {
  title: LIMITS.title.maxLength,
  summary: LIMITS.summary.maxLength,
  description: LIMITS.description.maxLength,
  item: LIMITS.coachingPoints.items.maxLength,
  coachingPoints: LIMITS.coachingPoints.maxItems,
  easier: LIMITS.easier.maxItems,
  harder: LIMITS.harder.maxItems,
  id: LIMITS.id.maxLength,
} as const;

/** The fields in the words of the form's labels. */
const FIELD_WORDS: Record<string, string> = {
  title: $localize`:Label of the activity's name field:Name`,
  summary: $localize`One-line summary`,
  description: $localize`What the players do`,
  kind: $localize`:Label of the field choosing what kind of activity it is:Kind`,
  layout: $localize`:Label of the field choosing how an activity is laid out on the pitch:Set-up`,
  'ages.from': $localize`Youngest age group`,
  'ages.to': $localize`Oldest age group`,
  levels: $localize`:Label of the playing levels an activity suits:Levels`,
  focus: $localize`:Label of the skills an activity works on:Works on`,
  intensity: $localize`:Label of how hard an activity is, 1 to 5:Intensity`,
  balls: $localize`:Label of how the activity uses footballs:Balls`,
  bibs: $localize`:Coloured vests that mark the sides:Bibs`,
  'players.min': $localize`Fewest players`,
  'players.max': $localize`Most players`,
  coachingPoints: $localize`Coaching points`,
  easier: $localize`:The steps that make an activity easier:Easier steps`,
  harder: $localize`:The steps that make an activity harder:Harder steps`,
};

const LIST_ITEM_WORDS: Record<string, string> = {
  coachingPoints: $localize`:One line of the coaching points, numbered after it:Coaching point`,
  easier: $localize`:One line of Make it easier, numbered after it:Easier step`,
  harder: $localize`:One line of Make it harder, numbered after it:Harder step`,
};

/** The words for a field path, list items numbered from 1: "Coaching point 3". */
export function fieldWords(path: string): string {
  const item = /^(coachingPoints|easier|harder)\.(\d+)$/.exec(path);
  if (item)
    return $localize`:A numbered line of a list, e.g. Coaching point 3:${LIST_ITEM_WORDS[item[1]]}:item: ${Number(item[2]) + 1}:number:`;
  return FIELD_WORDS[path] ?? $localize`:Names the whole activity in a form message:This activity`;
}

/** The form's values for an activity (a blank form when none). */
export function formValueOf(
  activity: ActivityDefinition | null,
  defaults: { kind: StationKind; layout: string },
): ActivityFormValue {
  return {
    title: activity?.title ?? '',
    summary: activity?.summary ?? '',
    description: activity?.description ?? '',
    kind: activity?.kind ?? defaults.kind,
    layout: activity?.layout ?? defaults.layout,
    ages: { ...(activity?.ages ?? { from: 'U9', to: 'U12' }) },
    levels: [...(activity?.levels ?? ['beginner', 'intermediate'])],
    focus: [...(activity?.focus ?? [])],
    intensity: activity?.intensity ?? 3,
    balls: activity?.balls ?? 'each',
    bibs: activity?.bibs ?? false,
    players: { ...(activity?.players ?? { min: 4, max: 8 }) },
    coachingPoints: activity ? [...activity.coachingPoints] : [''],
    easier: [...(activity?.easier ?? [])],
    harder: [...(activity?.harder ?? [])],
  };
}

/**
 * The activity the form describes. Blank list rows are left out; an activity being changed keeps
 * its id, a new one is `origin: 'club'` with an id made from its name.
 */
export function activityOf(
  value: ActivityFormValue,
  base: { id: string; origin?: 'club'; retired?: boolean } | null,
  takenIds: readonly string[],
): ActivityDefinition {
  const lines = (list: string[]) => list.map((line) => line.trim()).filter(Boolean);
  const activity: ActivityDefinition = {
    id: base?.id ?? activityId(value.title, takenIds),
    kind: value.kind,
    ...(value.layout ? { layout: value.layout } : {}),
    title: value.title.trim(),
    summary: value.summary.trim(),
    description: value.description.trim(),
    coachingPoints: lines(value.coachingPoints),
    easier: lines(value.easier),
    harder: lines(value.harder),
    ages: { ...value.ages },
    levels: [...value.levels],
    focus: [...value.focus],
    intensity: value.intensity,
    balls: value.balls,
    ...(value.bibs ? { bibs: true } : {}),
    players: { min: numberOrNaN(value.players.min), max: numberOrNaN(value.players.max) },
    origin: base ? base.origin : 'club',
    ...(base?.retired ? { retired: true } : {}),
  };
  if (!activity.origin) delete activity.origin;
  return activity;
}

/** "Rondo: 4 v 1!" → "club-rondo-4-v-1", with -2, -3… when the club has it already. */
export function activityId(title: string, takenIds: readonly string[]): string {
  const slug = title
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  const stem = `club-${slug || 'activity'}`.slice(0, ACTIVITY_LIMITS.id - 3).replace(/-+$/, '');
  const taken = new Set(takenIds);
  if (!taken.has(stem)) return stem;
  for (let n = 2; ; n++) if (!taken.has(`${stem}-${n}`)) return `${stem}-${n}`;
}

/**
 * Every field message, the form's own checks first (one per field): blanks, lengths, a name
 * another activity has; then the engine's check of the rule set with this activity at `index`.
 */
export function fieldMessages(
  value: ActivityFormValue,
  activity: ActivityDefinition,
  ruleSet: unknown,
  index: number,
): FieldMessages {
  const messages: FieldMessages = {};
  const add = (path: string, message: string) => {
    messages[path] ??= message;
  };
  const text = (path: 'title' | 'summary' | 'description', limit: number) => {
    const length = [...value[path].trim()].length;
    if (length === 0) add(path, $localize`${fieldWords(path)}:field: is needed.`);
    else if (length > limit)
      add(
        path,
        $localize`${fieldWords(path)}:field:: keep it to ${limit}:limit: characters (now ${length}:length:).`,
      );
  };
  text('title', ACTIVITY_LIMITS.title);
  text('summary', ACTIVITY_LIMITS.summary);
  text('description', ACTIVITY_LIMITS.description);
  for (const list of ['coachingPoints', 'easier', 'harder'] as const) {
    value[list].forEach((line, i) => {
      const length = [...line.trim()].length;
      if (length > ACTIVITY_LIMITS.item)
        add(
          `${list}.${i}`,
          $localize`${fieldWords(`${list}.${i}`)}:field:: keep it to ${ACTIVITY_LIMITS.item}:limit: characters (now ${length}:length:).`,
        );
    });
  }
  if (!value.coachingPoints.some((line) => line.trim()))
    add('coachingPoints', $localize`Add at least one coaching point.`);
  if (!value.levels.length) add('levels', $localize`Choose at least one level.`);
  for (const end of ['min', 'max'] as const) {
    if (value.players[end] === null || Number.isNaN(value.players[end]))
      add(`players.${end}`, $localize`${fieldWords(`players.${end}`)}:field: is needed.`);
  }
  const activities = (ruleSet as { parameters?: { activities?: ActivityDefinition[] } } | null)?.parameters
    ?.activities;
  const title = value.title.trim().toLowerCase();
  const twin = (activities ?? []).find((a, i) => i !== index && a.title.trim().toLowerCase() === title);
  if (title && twin)
    add(
      'title',
      $localize`Another activity is already called “${twin.title}:activityTitle:”: pick a name coaches can tell apart.`,
    );

  if (activities) {
    const doc = setAt(ruleSet, `/parameters/activities/${index}`, activity);
    const prefix = `/parameters/activities/${index}`;
    for (const error of validateRuleSet(doc).errors) {
      if (error.pointer !== prefix && !error.pointer.startsWith(prefix + '/')) continue;
      const path = fieldPath(error.pointer.slice(prefix.length));
      add(path, coachWords(path, error.message));
    }
  }
  return messages;
}

/** The form field a pointer inside the activity names ("/players" → the most-players box). */
function fieldPath(pointer: string): string {
  const tokens = pointer.split('/').filter(Boolean);
  if (!tokens.length) return 'form';
  if (tokens[0] === 'id') return 'title';
  if (tokens[0] === 'ages') return tokens[1] === 'from' ? 'ages.from' : 'ages.to';
  if (tokens[0] === 'players') return tokens[1] === 'min' ? 'players.min' : 'players.max';
  if (['coachingPoints', 'easier', 'harder'].includes(tokens[0]) && tokens[1] !== undefined)
    return `${tokens[0]}.${tokens[1]}`;
  if (['levels', 'focus'].includes(tokens[0])) return tokens[0];
  return tokens[0] in FIELD_WORDS ? tokens[0] : 'form';
}

/** The engine's message for a field, said the way the form says it. */
export function coachWords(path: string, message: string): string {
  const words = fieldWords(path);
  let m: RegExpExecArray | null;
  // The engine's messages are matched in its own (English) words; what the lead reads is translated.
  if ((m = /can have at most (\d+) characters/.exec(message)))
    return $localize`${words}:field:: keep it to ${m[1]}:limit: characters.`;
  if (/cannot be empty|is missing/.test(message)) return $localize`${words}:field: is needed.`;
  if ((m = /can have at most (\d+) entries/.exec(message)))
    return $localize`:A list field and its most entries:${words}:field:: at most ${m[1]}:most:.`;
  if (/needs at least (one entry|\d+ entries)/.test(message))
    return path === 'levels'
      ? $localize`Choose at least one level.`
      : $localize`Add at least one coaching point.`;
  if (/lists the same thing twice/.test(message)) return $localize`${words}:field:: each choice once.`;
  if ((m = /must be at least (\d+)/.exec(message)))
    return $localize`${words}:field: must be at least ${m[1]}:least:.`;
  if ((m = /must be at most (\d+)/.exec(message)))
    return $localize`${words}:field: must be at most ${m[1]}:most:.`;
  if (/must be a whole number/.test(message)) return $localize`${words}:field: must be a whole number.`;
  if (/the oldest age \(.*\) is below the youngest/.test(message))
    return $localize`The oldest age group must not be younger than the youngest.`;
  if (/the most players in a group \(\d+\) is below the fewest/.test(message))
    return $localize`Most players must be at least the fewest players.`;
  if (/is the same as that of/.test(message))
    return $localize`Another activity already has this name: pick another.`;
  if (path === 'title' && /characters that are not allowed/.test(message))
    return $localize`Name needs at least one letter or number.`;
  if (path === 'layout') return $localize`Choose one of the set-ups this kind can draw.`;
  if (/must be one of/.test(message)) return $localize`${words}:field:: choose one of the options.`;
  // The check's own sentence names the place already: keep only what is wrong.
  const what = message.slice(message.indexOf(': ') + 2).replace(/\.$/, '');
  return $localize`:A field, then the rules check's own words about it:${words}:field:: ${what}:problem:.`;
}

function numberOrNaN(value: number | null): number {
  return value === null ? Number.NaN : value;
}
