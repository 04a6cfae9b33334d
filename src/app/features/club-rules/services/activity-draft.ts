/**
 * The club activity form's model: the form's values as an activity of the rule set, a new
 * activity's id, and every message for the form's fields in a coach's words: simple
 * required/length checks with the rule-set schema's own limits, then the engine's check of the
 * whole draft with the activity in place, its JSON pointers mapped back to the fields.
 */
import { validateRuleSet } from '../../../../../engine/index';
import ruleSetSchema from '../../../../../shared/schemas/rule-set.schema.json';
import type {
  ActivityDefinition,
  AgeGroup,
  BallUse,
  Focus,
  Level,
  StationKind,
} from '../../../../../shared/types';
import { setAt } from './json-pointer';

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
  title: 'Name',
  summary: 'One-line summary',
  description: 'What the players do',
  kind: 'Kind',
  layout: 'Set-up',
  'ages.from': 'Youngest age group',
  'ages.to': 'Oldest age group',
  levels: 'Levels',
  focus: 'Works on',
  intensity: 'Intensity',
  balls: 'Balls',
  bibs: 'Bibs',
  'players.min': 'Fewest players',
  'players.max': 'Most players',
  coachingPoints: 'Coaching points',
  easier: 'Easier steps',
  harder: 'Harder steps',
};

const LIST_ITEM_WORDS: Record<string, string> = {
  coachingPoints: 'Coaching point',
  easier: 'Easier step',
  harder: 'Harder step',
};

/** The words for a field path, list items numbered from 1: "Coaching point 3". */
export function fieldWords(path: string): string {
  const item = /^(coachingPoints|easier|harder)\.(\d+)$/.exec(path);
  if (item) return `${LIST_ITEM_WORDS[item[1]]} ${Number(item[2]) + 1}`;
  return FIELD_WORDS[path] ?? 'This activity';
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
    if (length === 0) add(path, `${fieldWords(path)} is needed.`);
    else if (length > limit)
      add(path, `${fieldWords(path)}: keep it to ${limit} characters (now ${length}).`);
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
          `${fieldWords(`${list}.${i}`)}: keep it to ${ACTIVITY_LIMITS.item} characters (now ${length}).`,
        );
    });
  }
  if (!value.coachingPoints.some((line) => line.trim()))
    add('coachingPoints', 'Add at least one coaching point.');
  if (!value.levels.length) add('levels', 'Choose at least one level.');
  for (const end of ['min', 'max'] as const) {
    if (value.players[end] === null || Number.isNaN(value.players[end]))
      add(`players.${end}`, `${fieldWords(`players.${end}`)} is needed.`);
  }
  const activities = (ruleSet as { parameters?: { activities?: ActivityDefinition[] } } | null)?.parameters
    ?.activities;
  const title = value.title.trim().toLowerCase();
  const twin = (activities ?? []).find((a, i) => i !== index && a.title.trim().toLowerCase() === title);
  if (title && twin)
    add('title', `Another activity is already called “${twin.title}”: pick a name coaches can tell apart.`);

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
  if ((m = /can have at most (\d+) characters/.exec(message)))
    return `${words}: keep it to ${m[1]} characters.`;
  if (/cannot be empty|is missing/.test(message)) return `${words} is needed.`;
  if ((m = /can have at most (\d+) entries/.exec(message))) return `${words}: at most ${m[1]}.`;
  if (/needs at least (one entry|\d+ entries)/.test(message))
    return path === 'levels' ? 'Choose at least one level.' : 'Add at least one coaching point.';
  if (/lists the same thing twice/.test(message)) return `${words}: each choice once.`;
  if ((m = /must be at least (\d+)/.exec(message))) return `${words} must be at least ${m[1]}.`;
  if ((m = /must be at most (\d+)/.exec(message))) return `${words} must be at most ${m[1]}.`;
  if (/must be a whole number/.test(message)) return `${words} must be a whole number.`;
  if (/the oldest age \(.*\) is below the youngest/.test(message))
    return 'The oldest age group must not be younger than the youngest.';
  if (/the most players in a group \(\d+\) is below the fewest/.test(message))
    return 'Most players must be at least the fewest players.';
  if (/is the same as that of/.test(message)) return 'Another activity already has this name: pick another.';
  if (path === 'title' && /characters that are not allowed/.test(message))
    return 'Name needs at least one letter or number.';
  if (path === 'layout') return 'Choose one of the set-ups this kind can draw.';
  if (/must be one of/.test(message)) return `${words}: choose one of the options.`;
  // The check's own sentence names the place already: keep only what is wrong.
  const what = message.slice(message.indexOf(': ') + 2).replace(/\.$/, '');
  return `${words}: ${what}.`;
}

function numberOrNaN(value: number | null): number {
  return value === null ? Number.NaN : value;
}
