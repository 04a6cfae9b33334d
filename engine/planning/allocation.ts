/**
 * Splits the players of a phase into stations of allowed sizes: minimises the deviation from
 * the preferred size, coach fill-ins and leftover stations, within the kit's and the adults'
 * station limits.
 */
import type {
  ActivityDefinition,
  AgeBand,
  Equipment,
  Level,
  RuleParameters,
  StationKind,
} from '../../shared/types';
import { kindModule, layoutOf } from '../kinds/registry';
import type { SizeRule } from './size-rule';

/** What keeping last phase's grids standing is worth, in players away from the preferred size. */
const SAME_LAYOUT_BONUS = 1;

/** One game for the squad rather than two smaller ones when the format allows it (common practice). */
const EXTRA_GAME_COST = 3;

export interface GroupPlan {
  activity: ActivityDefinition;
  /** Players in the group (the coach, when joining, is extra). */
  players: number;
  coachJoins: 0 | 1;
}

export interface Allocation {
  groups: GroupPlan[];
  cost: number;
}

export interface AllocationRules {
  params: RuleParameters;
  level: Level;
  band: AgeBand;
  kit: Equipment;
  /** Activities to try, best first, for groups left over when a kind's sizes do not divide. */
  substitutes(kind: StationKind): ActivityDefinition[];
  /** Cap on stations in the phase (the adults present, or the space). */
  maxStations?: number;
  /** The last phase's station count: the same count lets its grids stand (a small saving). */
  sameStationsAs?: number;
  /** Keepers are in goal: one game with a keeper each end, not one with keepers and one without. */
  keepersInGame?: boolean;
}

/** The same rules with a cap on stations. */
export function withStationCap(rules: AllocationRules, maxStations: number): AllocationRules {
  return {
    params: rules.params,
    level: rules.level,
    band: rules.band,
    kit: rules.kit,
    substitutes: rules.substitutes,
    maxStations,
    sameStationsAs: rules.sameStationsAs,
    keepersInGame: rules.keepersInGame,
  };
}

export function sizeRuleOf(
  activity: ActivityDefinition,
  rules: Pick<AllocationRules, 'params' | 'level' | 'band'>,
): SizeRule | null {
  return kindModule(activity.kind).sizes(rules.params, rules.level, rules.band, activity);
}

/**
 * How many stations of an activity the kit supports: each needs its goals (or gates of two
 * cones) and, when it uses balls, at least one ball.
 */
export function stationLimit(activity: ActivityDefinition, kit: Equipment): number {
  const spec = kindModule(activity.kind).targets(layoutOf(activity));
  const targets = kit.goals + Math.floor(kit.cones / 2);
  let limit = Number.POSITIVE_INFINITY;
  if (!spec.optional && spec.ends === 1) limit = targets;
  if (!spec.optional && spec.ends === 2) limit = Math.floor(targets / 2);
  if (activity.balls !== 'none') limit = Math.min(limit, kit.balls);
  return limit;
}

/** All n players in groups of one activity, or null when the sizes cannot work. */
export function groupsOfOneKind(
  n: number,
  coaches: number,
  activity: ActivityDefinition,
  rules: AllocationRules,
): Allocation | null {
  if (n <= 0) return { groups: [], cost: 0 };
  const size = sizeRuleOf(activity, rules);
  if (!size) return null;
  const limit = Math.min(n, stationLimit(activity, rules.kit), rules.maxStations ?? Number.POSITIVE_INFINITY);
  const coachPenalty = rules.params.allocation.coachPenalty;
  const game = activity.kind === 'small-sided-game';
  let best: Allocation | null = null;
  for (let k = Math.max(1, Math.floor(n / size.max)); k <= limit; k++) {
    if ((n + Math.min(coaches, k)) / k < size.min) break;
    for (let j = 0; j <= Math.min(coaches, k); j++) {
      const total = n + j;
      const q = Math.floor(total / k);
      const r = total % k;
      if (!size.allows(q) || (r > 0 && !size.allows(q + 1))) continue;
      // A coach joins a group only when that leaves every group with at least one player.
      if (j > 0 && q - 1 < 1) continue;
      const cost =
        r * Math.abs(q + 1 - size.preferred) +
        (k - r) * Math.abs(q - size.preferred) +
        j * coachPenalty +
        (game
          ? (k - 1) * (rules.keepersInGame ? 10 * EXTRA_GAME_COST : EXTRA_GAME_COST)
          : k === rules.sameStationsAs
            ? -SAME_LAYOUT_BONUS
            : 0);
      if (!best || cost < best.cost - 1e-9) {
        const groups: GroupPlan[] = [];
        for (let g = 0; g < k; g++) {
          const groupTotal = g < r ? q + 1 : q;
          const joins: 0 | 1 = g < j ? 1 : 0;
          groups.push({ activity, players: groupTotal - joins, coachJoins: joins });
        }
        best = { groups, cost };
      }
    }
  }
  return best;
}

/**
 * Groups for a phase of one activity: all in it when numbers allow, otherwise as many as fit
 * and the rest in the first substitute that works. Infinite cost when nothing fits.
 */
export function allocatePhase(
  n: number,
  coaches: number,
  activity: ActivityDefinition,
  rules: AllocationRules,
): Allocation {
  const whole = groupsOfOneKind(n, coaches, activity, rules);
  if (whole) return whole;
  const penalty = rules.params.allocation.fallbackStationPenalty;
  let best: Allocation | null = null;
  const substitutes = rules.params.kinds[activity.kind].substitutes.flatMap((k) => rules.substitutes(k));
  // At least one group plays the activity itself; the rest go to a substitute.
  for (let leftover = 1; leftover < n; leftover++) {
    const main = groupsOfOneKind(n - leftover, coaches, activity, rules);
    if (!main || !main.groups.length) continue;
    const coachesLeft = coaches - main.groups.reduce((s, g) => s + g.coachJoins, 0);
    const capLeft = (rules.maxStations ?? Number.POSITIVE_INFINITY) - main.groups.length;
    if (capLeft < 1) continue;
    // The main groups have taken their balls: the leftover groups share what is left.
    const ballsLeft = activity.balls === 'none' ? rules.kit.balls : rules.kit.balls - main.groups.length;
    const restRules = {
      ...withStationCap(rules, capLeft),
      kit: { ...rules.kit, balls: Math.max(0, ballsLeft) },
    };
    for (const sub of substitutes) {
      const rest = groupsOfOneKind(leftover, coachesLeft, sub, restRules);
      if (!rest) continue;
      const cost = main.cost + rest.cost + penalty * rest.groups.length;
      if (!best || cost < best.cost - 1e-9) best = { groups: [...main.groups, ...rest.groups], cost };
      break;
    }
  }
  if (best) return best;
  return { groups: [{ activity, players: n, coachJoins: 0 }], cost: Number.POSITIVE_INFINITY };
}

/**
 * Whether the whole squad can play an activity: at least one group can be formed from n players
 * and the free coaches, and the groups the kit and the adults allow can hold everyone.
 */
export function activityFeasible(
  n: number,
  coaches: number,
  activity: ActivityDefinition,
  rules: Pick<AllocationRules, 'params' | 'level' | 'band' | 'kit'>,
): boolean {
  const size = sizeRuleOf(activity, rules);
  const limit = stationLimit(activity, rules.kit);
  if (!size || limit < 1) return false;
  const stations = Math.min(limit, rules.params.supervision.stationsPerAdult * Math.max(1, coaches));
  return (
    n >= 1 && n + Math.min(coaches, 1) >= size.min && n <= stations * size.max + Math.min(coaches, stations)
  );
}
