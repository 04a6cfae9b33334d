/** Keep-ball: a passing square against defenders; a defender who wins the ball breaks out to score. */
import '../../shared/i18n/localize';
import type { KeepBallFormat, Level, RuleParameters } from '../../shared/types';
import type { KindModule } from './kind-module';
import { ballNeed, circle, corners, groupCount, perimeter, place, setUp, waitingFor } from './common';
import type { SizeRule } from '../planning/size-rule';

/**
 * How many attackers per defender keep-ball at a level plays with: at least two (fewer and the
 * defenders win the ball at once — common practice), at most the rule set's own parameter (its
 * schema caps it at 4).
 */
export function keepBallRatio(params: RuleParameters, level: Level): { min: number; max: number } {
  return { min: 2, max: params.keepBall[level].maxAttackersPerDefender };
}

/** Whether `attackers` against `defenders` keeps the level's ratio. */
export function keepsKeepBallRatio(
  params: RuleParameters,
  level: Level,
  attackers: number,
  defenders: number,
): boolean {
  const { min, max } = keepBallRatio(params, level);
  return defenders > 0 && attackers / defenders >= min && attackers / defenders <= max;
}

/** The keep-ball format for a group (players plus a joining coach), most preferred first. */
export function keepBallFormat(params: RuleParameters, level: Level, total: number): KeepBallFormat {
  const exact = params.keepBall[level].formats.find((f) => f.attackers + f.defenders === total);
  if (exact) return exact;
  // Out-of-table sizes (after a coach's edit): fewest defenders that keep the level's ratio.
  const defenders = Math.max(1, Math.ceil(total / (keepBallRatio(params, level).max + 1)));
  return { attackers: Math.max(0, total - defenders), defenders };
}

/** Keep-ball groups are the level's formats, within the activity's player range. */
export function keepBallSizes(
  params: RuleParameters,
  level: Level,
  range: { min: number; max: number },
): SizeRule | null {
  const totals = params.keepBall[level].formats
    .map((f) => f.attackers + f.defenders)
    .filter((t) => t >= range.min && t <= range.max);
  if (!totals.length) return null;
  return {
    min: Math.min(...totals),
    preferred: totals[0],
    max: Math.max(...totals),
    allows: (t) => totals.includes(t),
  };
}

export const keepBall: KindModule = {
  kind: 'keep-ball',
  layouts: [
    setUp(
      'square',
      () => $localize`:set-up of an activity, how it is laid out:A square with a breakout gate on two sides`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 2, optional: true, keepers: false }),
  sizes: (params, level, _band, activity) => keepBallSizes(params, level, activity.players),
  roles: ({ players, coachJoins, params, level }) => {
    const format = keepBallFormat(params, level, players.length + coachJoins);
    // Defenders come from the outfield players: never two goalkeepers pressing in one square.
    const ordered = [...players.filter((p) => p.goalkeeper), ...players.filter((p) => !p.goalkeeper)].map(
      (p) => p.id,
    );
    const defenders = ordered.slice(ordered.length - Math.min(format.defenders, ordered.length));
    const attackers = ordered.filter((id) => !defenders.includes(id));
    const a = attackers.length + coachJoins;
    return {
      roles: { attackers, defenders, rotation: [...defenders, ...attackers] },
      format: $localize`:attackers against defenders in keep-ball, e.g. 4v1:${a}:attackers:v${defenders.length}:defenders:`,
      points:
        defenders.length > 1
          ? [
              $localize`:coaching point that follows from the roles:Defenders: the first presses the ball, the second covers the pass through the middle`,
            ]
          : [
              $localize`:coaching point that follows from the roles:Defender: curve your run to cut off one pass, then press the ball`,
            ],
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 1),
  bibs: (station) => station.roles.defenders?.length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station) => {
    const attackers = station.roles.attackers ?? [];
    const defenders = station.roles.defenders ?? [];
    const ring = perimeter(attackers.length + station.coachJoins, across, along, 0.8);
    const middle = circle(
      defenders.length,
      across / 2,
      along / 2,
      defenders.length > 1 ? Math.min(across, along) * 0.12 : 0,
    );
    return {
      essential: [],
      outline: corners(across, along),
      extra: [],
      positions: [
        ...place(attackers, ring, 'attacker'),
        ...(station.coachJoins ? [{ id: 'coach', role: 'coach' as const, ...ring[ring.length - 1] }] : []),
        ...place(defenders, middle, 'defender'),
      ],
    };
  },
};
