/** A goalkeepers' warm-up in a real goal: handling, footwork, then shots. */
import type { KindModule } from './kind-module';
import { ballNeed, coachAt, groupCount, place, tableSizes, waitingFor } from './common';

export const goalkeeping: KindModule = {
  kind: 'goalkeeping',
  layouts: [{ id: 'goal', label: 'A goalkeeper in a real goal, a server in front' }],
  facesShots: false,
  targets: () => ({ ends: 1, keepers: true }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'goalkeeping', level, activity),
  roles: ({ players, keepers, coachJoins }) => {
    const servers = players.map((p) => p.id).filter((id) => !keepers.includes(id));
    const who = coachJoins
      ? 'a coach serving'
      : servers.length
        ? `${servers.length} serving`
        : keepers.length > 1
          ? 'serving each other'
          : 'with a ball of their own';
    return {
      roles: { goalkeeper: keepers, servers, rotation: keepers },
      format: `${keepers.length} goalkeeper${keepers.length === 1 ? '' : 's'}, ${who}`,
      points: [
        keepers.length > 1
          ? 'Goalkeepers swap between the goal and serving every six to eight balls'
          : 'Server: start with throws to the hands, then volleys, then shots along the ground',
      ],
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 5),
  bibs: () => 0,
  waiting: (station, activity) =>
    waitingFor(station, activity, Math.max(0, (station.roles.goalkeeper?.length ?? 0) - 2)),
  draw: ({ across, along }, station) => {
    const keepers = station.roles.goalkeeper ?? [];
    const servers = station.roles.servers ?? [];
    const serve = { u: across / 2, v: along * 0.4 };
    const ladder = [0.2, 0.35, 0.5, 0.65].map((f) => ({ u: across * 0.12, v: along * f }));
    return {
      essential: [serve],
      outline: [],
      extra: ladder,
      positions: [
        ...place(keepers.slice(0, 1), [{ u: across / 2, v: along - 0.6 }], 'goalkeeper'),
        ...place(
          keepers.slice(1),
          [
            { u: across / 2 + 1.2, v: serve.v },
            { u: across * 0.12, v: along * 0.2 },
          ],
          'goalkeeper',
        ),
        ...place(servers, [serve, { u: serve.u - 1.5, v: serve.v }], 'server'),
        ...coachAt(station, { u: serve.u - 1, v: serve.v - 0.5 }),
      ],
    };
  },
};
