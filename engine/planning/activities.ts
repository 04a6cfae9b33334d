/**
 * Which activities a request may use, and how well each fits: age, level, the club's rules, the
 * kit, the weather, the focus, the coach's pins and what the team did lately.
 */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  ActivityKind,
  AgeGroup,
  ForbiddenActivity,
  RuleParameters,
  StationKind,
} from '../../shared/types';
import { AGE_GROUPS, ageGroupLabel } from '../../shared/types';
import { kindModule, layoutOf } from '../kinds/registry';
import type { BuildContext } from './context';

/** Keepers the activity's set-up can put in goal (0 when it has no goal for them). */
function hostsKeepers(a: ActivityDefinition): number {
  const m = kindModule(a.kind);
  const t = m.targets(layoutOf(a));
  return m.facesShots && t.keepers ? t.ends : 0;
}

/**
 * Why something may not be used: the club's reason, or a function that writes the engine's own
 * words (so a check that needs only yes or no writes none); null when it may be used.
 */
type Block = string | (() => string) | null;

function words(block: Block): string | null {
  return typeof block === 'function' ? block() : block;
}

function kindBlock(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  kind: ActivityKind,
): Block {
  if (!params.ageGroups[age].allowedKinds.includes(kind))
    return () =>
      $localize`:why an activity cannot be used today:not in the club's activities for ${ageInSentence(age)}:ageGroup:`;
  const rule = forbidden.find((f) => f.kind === kind && !f.activityId);
  return rule ? rule.reason : null;
}

/** Why a kind may not be used, or null when it may. */
export function kindBlocked(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  kind: ActivityKind,
): string | null {
  return words(kindBlock(params, age, forbidden, kind));
}

function activityBlock(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  activity: ActivityDefinition,
): Block {
  if (activity.retired) return () => $localize`:why an activity cannot be used today:retired by the club`;
  const byKind = kindBlock(params, age, forbidden, activity.kind);
  if (byKind) return byKind;
  const rule = forbidden.find((f) => f.activityId === activity.id);
  if (rule) return rule.reason;
  if (!suitsAge(activity, age))
    return () =>
      $localize`:why an activity cannot be used today, e.g. made for U9–U12:made for ${ageInSentence(activity.ages.from)}:youngest:–${ageInSentence(activity.ages.to)}:oldest:`;
  return null;
}

/**
 * Why an activity may not be used for this age, or null when it may. The level is a preference
 * (`activityScore`), not a bar: an activity for intermediates still suits an advanced group.
 */
export function activityBlocked(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  activity: ActivityDefinition,
): string | null {
  return words(activityBlock(params, age, forbidden, activity));
}

/** Why an activity the age may play cannot be used with this squad: its numbers or the kit. */
export function notEnoughForIt(): string {
  return $localize`:why an activity cannot be used today:too few players or not enough kit for it`;
}

/** An age group inside a sentence: "U10" as coaches write it, "adult" in lower case. */
export function ageInSentence(age: AgeGroup): string {
  return age === 'adult' ? $localize`:age group inside a sentence, e.g. for adult:adult` : ageGroupLabel(age);
}

export function suitsAge(activity: Pick<ActivityDefinition, 'ages'>, age: AgeGroup): boolean {
  const i = AGE_GROUPS.indexOf(age);
  return i >= AGE_GROUPS.indexOf(activity.ages.from) && i <= AGE_GROUPS.indexOf(activity.ages.to);
}

export function activityById(params: RuleParameters, id: string): ActivityDefinition | undefined {
  return params.activities.find((a) => a.id === id);
}

/** The usable activities of a kind for the request, best first (the seeded jitter breaks ties). */
/** What choosing needs from the build context. */
export type ChoiceContext = Pick<
  BuildContext,
  'params' | 'request' | 'forbidden' | 'rng' | 'focus' | 'recent' | 'pinned' | 'cold' | 'keepers'
>;

export function rankedActivities(ctx: ChoiceContext, kind: StationKind, kindRank = 0): Ranked[] {
  const { params, request } = ctx;
  const out: Ranked[] = [];
  for (const a of params.activities) {
    if (a.kind !== kind) continue;
    if (activityBlock(params, request.ageGroup, ctx.forbidden, a)) continue;
    out.push({ activity: a, score: activityScore(ctx, a) - kindRank + ctx.rng() * JITTER });
  }
  // Above the day's intensity limit (the heat) only when the kind has nothing calmer; a pin stays.
  const calm = out.filter(
    (r) => r.activity.intensity <= params.intensity.max || ctx.pinned.has(r.activity.id),
  );
  return (calm.length ? calm : out).sort((x, y) => y.score - x.score);
}

/** A seeded nudge between near-equal activities, so plans vary from one week to the next. */
const JITTER = 1.5;

export interface Ranked {
  activity: ActivityDefinition;
  score: number;
}

/**
 * How well an activity fits: the theme and focuses it serves, a pin, how lately the team used it,
 * its intensity against the day's limit and its balls against the bag.
 */
export function activityScore(ctx: ChoiceContext, a: ActivityDefinition): number {
  const { request, params } = ctx;
  let score = 0;
  ctx.focus.forEach((f, i) => {
    if (a.focus.includes(f)) score += i === 0 ? 5 : 3;
  });
  if (ctx.pinned.has(a.id)) score += 100;
  if (ctx.recent.has(a.id)) score -= params.variety.recentPenalty;
  if (a.intensity > params.intensity.max) score -= 50;
  if (!a.levels.includes(request.level)) score -= 8;
  const n = request.players.length;
  const balls = request.equipment.balls;
  const young = params.ageGroups[request.ageGroup].index <= 12;
  const short =
    a.balls === 'each'
      ? Math.max(0, n - balls) / n
      : a.balls === 'pair'
        ? Math.max(0, Math.ceil(n / 2) - balls) / n
        : 0;
  // Shared balls leave players waiting: the more so, the worse, and never in the cold.
  score -= short * (ctx.cold ? 40 : 12);
  // Ball-less games only when balls are really short (players of 12 and under want a ball).
  if (a.balls === 'none') score += balls === 0 ? 20 : young && balls >= Math.ceil(n / 3) ? -30 : 0;
  else if (balls === 0) score -= 60;
  // Every player with a ball from the first minute when the bag allows it.
  if (a.balls === 'each' && balls >= n && young) score += 2;
  // Keepers who are here want a goal to stand in: a game with a keeper each end beats one
  // without (more than a focus match), a finishing practice with a goal a little.
  const hosts = hostsKeepers(a);
  if (hosts > 0 && ctx.keepers.length >= hosts) score += hosts === 2 ? 6 : 3;
  return score;
}
