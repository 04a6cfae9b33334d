/**
 * Splits the players of a phase into stations of allowed sizes: minimises the deviation from
 * the preferred size, coach fill-ins and leftover stations, within the kit's station limits.
 */
import type { ActivityKind, Equipment, Level, RuleParameters } from '../../shared/types';

export interface GroupPlan {
  kind: ActivityKind;
  /** Players in the group (the coach, when joining, is extra). */
  players: number;
  coachJoins: 0 | 1;
}

export interface Allocation {
  groups: GroupPlan[];
  cost: number;
}

export interface SizeRule {
  min: number;
  preferred: number;
  max: number;
  allows(total: number): boolean;
}

export function sizeRule(params: RuleParameters, kind: ActivityKind, level: Level): SizeRule {
  if (kind === 'keep-ball') {
    const totals = params.keepBall[level].formats.map((f) => f.attackers + f.defenders);
    return {
      min: Math.min(...totals),
      preferred: totals[0],
      max: Math.max(...totals),
      allows: (t) => totals.includes(t),
    };
  }
  const g = params.groupSizes[kind][level];
  return { min: g.min, preferred: g.preferred, max: g.max, allows: (t) => t >= g.min && t <= g.max };
}

/** How many stations of a kind the kit supports (goals, or gates of two cones). */
export function stationLimit(kind: ActivityKind, params: RuleParameters, kit: Equipment): number {
  const targets = kit.goals + Math.floor(kit.cones / 2);
  const goals = params.kinds[kind].goals;
  if (goals === 'one') return targets;
  if (goals === 'two') return Math.max(1, Math.floor(targets / 2));
  return Number.POSITIVE_INFINITY;
}

export interface AllocationRules {
  params: RuleParameters;
  level: Level;
  kit: Equipment;
  usable(kind: ActivityKind): boolean;
  /** Cap on stations in the phase (set when the space cannot hold more). */
  maxStations?: number;
}

/**
 * The same rules with a cap on stations. Spelled out rather than a spread: in V8 a spread with
 * an added key costs microseconds, and allocation asks for capped rules many times per phase.
 */
export function withStationCap(rules: AllocationRules, maxStations: number): AllocationRules {
  return { params: rules.params, level: rules.level, kit: rules.kit, usable: rules.usable, maxStations };
}

/** All n players in groups of one kind, or null when the sizes cannot work. */
export function groupsOfOneKind(
  n: number,
  coaches: number,
  kind: ActivityKind,
  rules: AllocationRules,
): Allocation | null {
  if (n <= 0) return { groups: [], cost: 0 };
  const size = sizeRule(rules.params, kind, rules.level);
  const limit = Math.min(
    n,
    stationLimit(kind, rules.params, rules.kit),
    rules.maxStations ?? Number.POSITIVE_INFINITY,
  );
  const coachPenalty = rules.params.allocation.coachPenalty;
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
        r * Math.abs(q + 1 - size.preferred) + (k - r) * Math.abs(q - size.preferred) + j * coachPenalty;
      if (!best || cost < best.cost - 1e-9) {
        const groups: GroupPlan[] = [];
        for (let g = 0; g < k; g++) {
          const groupTotal = g < r ? q + 1 : q;
          const joins: 0 | 1 = g < j ? 1 : 0;
          groups.push({ kind, players: groupTotal - joins, coachJoins: joins });
        }
        best = { groups, cost };
      }
    }
  }
  return best;
}

/**
 * Groups for a phase whose main kind is `kind`: all in that kind when numbers allow, otherwise
 * as many as fit and the rest in the first substitute kind that works.
 */
export function allocatePhase(
  n: number,
  coaches: number,
  kind: ActivityKind,
  rules: AllocationRules,
): Allocation {
  const whole = groupsOfOneKind(n, coaches, kind, rules);
  if (whole) return whole;
  const penalty = rules.params.allocation.fallbackStationPenalty;
  let best: Allocation | null = null;
  for (let leftover = 1; leftover <= n; leftover++) {
    const main = groupsOfOneKind(n - leftover, coaches, kind, rules);
    if (!main) continue;
    const coachesLeft = coaches - main.groups.reduce((s, g) => s + g.coachJoins, 0);
    const capLeft = (rules.maxStations ?? Number.POSITIVE_INFINITY) - main.groups.length;
    if (capLeft < 1) continue;
    const rest = leftoverGroups(leftover, coachesLeft, kind, withStationCap(rules, capLeft));
    if (!rest) continue;
    const cost = main.cost + rest.cost + penalty * rest.groups.length;
    if (!best || cost < best.cost - 1e-9) best = { groups: [...main.groups, ...rest.groups], cost };
  }
  if (best) return best;
  // Nothing in the club's rules fits: one station of the main kind, flagged by the caller.
  return { groups: [{ kind, players: n, coachJoins: 0 }], cost: Number.POSITIVE_INFINITY };
}

function leftoverGroups(
  n: number,
  coaches: number,
  kind: ActivityKind,
  rules: AllocationRules,
): Allocation | null {
  for (const substitute of rules.params.kinds[kind].substitutes) {
    if (!rules.usable(substitute)) continue;
    const groups = groupsOfOneKind(n, coaches, substitute, rules);
    if (groups) return groups;
  }
  return null;
}

/** Whether at least one group of a kind can be formed from n players and the free coaches. */
export function kindFeasible(
  n: number,
  coaches: number,
  kind: ActivityKind,
  rules: AllocationRules,
): boolean {
  const size = sizeRule(rules.params, kind, rules.level);
  if (stationLimit(kind, rules.params, rules.kit) < 1) return false;
  return n + Math.min(coaches, 1) >= size.min && n >= 1;
}
