/** Shooting games: finishing against defenders and a goalkeeper, under pressure. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import {
  ballNeed,
  corners,
  groupCount,
  outfieldIds,
  place,
  setUp,
  tableSizes,
  waitingFor,
  sidesOf,
  sidesWithTheirKeepers,
} from './common';

export const shootingGame: KindModule = {
  kind: 'shooting-game',
  layouts: [
    setUp(
      'one-goal',
      () =>
        $localize`:set-up of an activity, how it is laid out:Attackers against defenders at one goal; a defender who wins it counters to a gate`,
    ),
    setUp(
      'two-goals',
      () =>
        $localize`:set-up of an activity, how it is laid out:A small box between two goals, shoot on sight`,
    ),
  ],
  facesShots: true,
  targets: (layout) => ({ ends: layout === 'two-goals' ? 2 : 1, keepers: true }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'shooting-game', level, activity),
  roles: ({ players, keepers, layout }) => {
    const ids = players.map((p) => p.id);
    const outfield = ids.filter((id) => !keepers.includes(id));
    if (layout === 'two-goals') {
      const { teams, format } = sidesWithTheirKeepers(ids, keepers);
      return { roles: { goalkeeper: keepers, teams }, format };
    }
    const defenderCount = outfield.length >= 6 ? 2 : 1;
    const defenders = outfield.slice(outfield.length - defenderCount);
    const attackers = outfield.slice(0, outfield.length - defenderCount);
    return {
      roles: { goalkeeper: keepers, attackers, defenders, rotation: [...defenders, ...attackers] },
      format: keepers.length
        ? $localize`:station format in a coach's shorthand, attackers against defenders and a goalkeeper:${attackers.length}:attackers:v${defenders.length}:defenders: + goalkeeper`
        : $localize`:station format in a coach's shorthand, attackers against defenders:${attackers.length}:attackers:v${defenders.length}:defenders:`,
      points: [$localize`:coaching point that follows from the roles:Swap the defenders every two minutes`],
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 3),
  bibs: (station) => (station.roles.teams?.[0] ?? station.roles.defenders ?? []).length,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const keepers = station.roles.goalkeeper ?? [];
    if (layout === 'two-goals') {
      const { a, b, outA, outB } = sidesOf(station);
      const keeperA = a.filter((id) => keepers.includes(id));
      const keeperB = b.filter((id) => keepers.includes(id));
      return {
        essential: [],
        outline: corners(across, along),
        extra: [],
        positions: [
          ...place(keeperA, [{ u: across / 2, v: 0.6 }], 'goalkeeper'),
          ...place(keeperB, [{ u: across / 2, v: along - 0.6 }], 'goalkeeper'),
          ...place(outA, spreadAcross(outA.length, along * 0.4, across), 'team-a'),
          ...place(outB, spreadAcross(outB.length, along * 0.6, across), 'team-b'),
        ],
      };
    }
    const attackers = station.roles.attackers ?? outfieldIds(station);
    const defenders = station.roles.defenders ?? [];
    return {
      essential: [],
      outline: corners(across, along),
      extra: [],
      gates: [
        { u: across * 0.25, v: 0, edge: 'near' },
        { u: across * 0.75, v: 0, edge: 'near' },
      ],
      positions: [
        ...place(attackers, spreadAcross(attackers.length, along * 0.25, across), 'attacker'),
        ...place(defenders, spreadAcross(defenders.length, along * 0.62, across), 'defender'),
        ...place(keepers, [{ u: across / 2, v: along - 0.6 }], 'goalkeeper'),
      ],
    };
  },
};

export function spreadAcross(n: number, v: number, across: number): LocalPoint[] {
  return Array.from({ length: n }, (_, i) => ({ u: (across * (i + 1)) / (n + 1), v }));
}
