/** Duels: 1v1 in side-by-side lanes to the end line, or 2v2 / 2v1 in a box with a target at each end. */
import type { LocalPoint, KindModule } from './kind-module';
import { ballNeed, corners, groupCount, place, tableSizes, waitingFor } from './common';
import { rangeRule } from '../planning/size-rule';

export const duel: KindModule = {
  kind: 'duel',
  layouts: [
    { id: 'lanes', label: 'Side-by-side lanes, 1v1 in each, score over the end line' },
    { id: 'box', label: 'A box with a small goal or gate at each end, 2v2 or 2v1' },
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
        format: `${a.length}v${b.length}${neutral.length ? ' + 1 neutral' : ''}`,
        points: neutral.length ? ['The neutral plays for whichever side has the ball'] : undefined,
      };
    }
    const lanes = Math.max(1, Math.floor(ids.length / 2));
    const attackers = ids.filter((_, i) => i % 2 === 0);
    const defenders = ids.filter((_, i) => i % 2 === 1);
    return {
      roles: { attackers, defenders, teams: [attackers, defenders], rotation: ids },
      format: `1v1 in ${lanes} lane${lanes === 1 ? '' : 's'}${ids.length % 2 ? ' (one 2v1)' : ''}`,
      points: ['Swap attacker and defender after every duel; rest while your partner carries the ball back'],
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

function sideRow(n: number, v: number, across: number): LocalPoint[] {
  return Array.from({ length: n }, (_, i) => ({ u: (across * (i + 1)) / (n + 1), v }));
}
