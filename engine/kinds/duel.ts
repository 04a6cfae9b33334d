/** Duels: 1v1 in side-by-side lanes to the end line, or 2v2 / 2v1 in a box with a target at each end. */
import '../../shared/i18n/localize';
import type { LocalPoint, KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  groupCount,
  neutralPoint,
  place,
  setUp,
  sidesWithNeutral,
  tableSizes,
  waitingFor,
} from './common';
import { rangeRule } from '../planning/size-rule';

export const duel: KindModule = {
  kind: 'duel',
  layouts: [
    setUp(
      'lanes',
      () =>
        $localize`:set-up of an activity, how it is laid out:Side-by-side lanes, 1v1 in each, score over the end line`,
    ),
    setUp(
      'box',
      () =>
        $localize`:set-up of an activity, how it is laid out:A box with a small goal or gate at each end, 2v2 or 2v1`,
    ),
  ],
  facesShots: false,
  targets: (layout) => (layout === 'box' ? { ends: 2, keepers: false } : { ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => {
    const table = tableSizes(params, 'duel', level, activity);
    if (!table || activity.layout !== 'box') return table;
    const min = Math.max(3, table.min);
    const max = Math.min(5, table.max);
    return min <= max ? rangeRule(min, 4, max) : null;
  },
  roles: ({ players, layout }) => {
    const ids = players.map((p) => p.id);
    if (layout === 'box') {
      const neutral = ids.length % 2 ? [ids[ids.length - 1]] : [];
      const rest = ids.slice(0, ids.length - neutral.length);
      const a = rest.filter((_, i) => i % 2 === 0);
      const b = rest.filter((_, i) => i % 2 === 1);
      return {
        roles: { attackers: a, defenders: b, teams: [a, b], neutrals: neutral },
        format: sidesWithNeutral(a.length, b.length, neutral.length > 0),
        points: neutral.length ? [neutralPoint()] : undefined,
      };
    }
    const lanes = Math.max(1, Math.floor(ids.length / 2));
    const attackers = ids.filter((_, i) => i % 2 === 0);
    const defenders = ids.filter((_, i) => i % 2 === 1);
    return {
      roles: { attackers, defenders, teams: [attackers, defenders], rotation: ids },
      format: lanesFormat(lanes, ids.length % 2 === 1),
      points: [
        $localize`:coaching point that follows from the roles:Swap attacker and defender after every duel; rest while your partner carries the ball back`,
      ],
    };
  },
  balls: (activity, station) =>
    ballNeed(
      activity.balls,
      groupCount(station),
      station.roles.neutrals ? 1 : Math.max(1, Math.floor(station.playerIds.length / 2)),
      2,
    ),
  bibs: (station) => station.roles.teams?.[0].length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const a = station.roles.attackers ?? [];
    const d = station.roles.defenders ?? [];
    if (layout === 'box') {
      const n = station.roles.neutrals ?? [];
      return {
        essential: [],
        outline: corners(across, along),
        extra: [],
        positions: [
          ...place(a, sideRow(a.length, along * 0.3, across), 'team-a'),
          ...place(d, sideRow(d.length, along * 0.7, across), 'team-b'),
          ...place(n, [{ u: across / 2, v: along / 2 }], 'neutral'),
        ],
      };
    }
    const lanes = Math.max(1, d.length);
    const width = across / lanes;
    const cones: LocalPoint[] = [];
    for (let i = 0; i <= lanes; i++) cones.push({ u: i * width, v: 0 }, { u: i * width, v: along });
    const attack: LocalPoint[] = a.map((_, i) => ({
      u: Math.min(lanes - 1, i) * width + width / 2 + (i >= lanes ? 0.8 : 0),
      v: 1,
    }));
    const defend: LocalPoint[] = d.map((_, i) => ({ u: i * width + width / 2, v: along * 0.55 }));
    return {
      essential: cones,
      outline: [],
      extra: [],
      positions: [...place(a, attack, 'team-a'), ...place(d, defend, 'team-b')],
    };
  },
};

/** "1v1 in 3 lanes", with "(one 2v1)" when a player is over. */
function lanesFormat(lanes: number, odd: boolean): string {
  if (lanes === 1)
    return odd
      ? $localize`:station format in a coach's shorthand, duels side by side, one lane with three players:1v1 in 1 lane (one 2v1)`
      : $localize`:station format in a coach's shorthand, duels side by side:1v1 in 1 lane`;
  return odd
    ? $localize`:station format in a coach's shorthand, duels side by side, one lane with three players:1v1 in ${lanes}:lanes: lanes (one 2v1)`
    : $localize`:station format in a coach's shorthand, duels side by side:1v1 in ${lanes}:lanes: lanes`;
}

function sideRow(n: number, v: number, across: number): LocalPoint[] {
  return Array.from({ length: n }, (_, i) => ({ u: (across * (i + 1)) / (n + 1), v }));
}
