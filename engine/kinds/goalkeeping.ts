/** A goalkeepers' warm-up in a real goal: handling, footwork, then shots. */
import '../../shared/i18n/localize';
import type { KindModule } from './kind-module';
import { ballNeed, coachAt, groupCount, place, setUp, tableSizes, waitingFor } from './common';

export const goalkeeping: KindModule = {
  kind: 'goalkeeping',
  layouts: [
    setUp(
      'goal',
      () =>
        $localize`:set-up of an activity, how it is laid out:A goalkeeper in a real goal, a server in front`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 1, keepers: true }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'goalkeeping', level, activity),
  roles: ({ players, keepers, coachJoins }) => {
    const servers = players.map((p) => p.id).filter((id) => !keepers.includes(id));
    const who = coachJoins
      ? $localize`:who serves the goalkeepers, after their number:a coach serving`
      : servers.length
        ? $localize`:who serves the goalkeepers, after their number:${servers.length}:servers: serving`
        : keepers.length > 1
          ? $localize`:who serves the goalkeepers, after their number:serving each other`
          : $localize`:who serves the goalkeeper, after their number:with a ball of their own`;
    return {
      roles: { goalkeeper: keepers, servers, rotation: keepers },
      format:
        keepers.length === 1
          ? $localize`:station format in a coach's shorthand, then who serves:1 goalkeeper, ${who}:whoServes:`
          : $localize`:station format in a coach's shorthand, then who serves:${keepers.length}:goalkeepers: goalkeepers, ${who}:whoServes:`,
      points: [
        keepers.length > 1
          ? $localize`:coaching point that follows from the roles:Goalkeepers swap between the goal and serving every six to eight balls`
          : $localize`:coaching point that follows from the roles:Server: start with throws to the hands, then volleys, then shots along the ground`,
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
