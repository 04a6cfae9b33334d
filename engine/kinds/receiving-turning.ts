/** Receiving and turning: a receiver between servers opens up, receives and turns away. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import {
  ballNeed,
  coachAt,
  corners,
  gateAcross,
  groupCount,
  place,
  setUp,
  tableSizes,
  waitingFor,
} from './common';

export const receivingTurning: KindModule = {
  kind: 'receiving-turning',
  layouts: [
    setUp(
      'channel',
      () =>
        $localize`:set-up of an activity, how it is laid out:A channel: server, receiver in the middle, server`,
    ),
    setUp(
      'square',
      () =>
        $localize`:set-up of an activity, how it is laid out:Servers on the corners of a square, a receiver in the middle`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'receiving-turning', level, activity),
  roles: ({ players, layout, coachJoins }) => {
    const ids = players.map((p) => p.id);
    const total = ids.length + coachJoins;
    // Channel: the two ends serve; square: all but one serve from the corners.
    const receiverCount = layout === 'square' ? 1 : Math.max(1, total - 2);
    const receivers = ids.slice(0, Math.min(receiverCount, ids.length));
    const servers = ids.slice(receivers.length);
    return {
      roles: { attackers: receivers, servers, rotation: ids },
      format: $localize`:station format in a coach's shorthand, players who pass and players who receive:${servers.length + coachJoins}:servers: serving, ${receivers.length}:receivers: receiving`,
      points: [
        $localize`:coaching point that follows from the roles:Swap the receiver every six to eight balls`,
      ],
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 1),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const receivers = station.roles.attackers ?? [];
    const servers = station.roles.servers ?? [];
    const mid: LocalPoint = { u: across / 2, v: along / 2 };
    if (layout === 'square') {
      const spots = corners(across, along).map((c) => ({
        u: c.u === 0 ? 0.8 : across - 0.8,
        v: c.v === 0 ? 0.8 : along - 0.8,
      }));
      return {
        essential: corners(across, along),
        outline: [],
        extra: [],
        positions: [
          ...place(servers, spots, 'server'),
          ...coachAt(station, spots[servers.length % 4]),
          ...place(receivers, [mid], 'attacker'),
        ],
      };
    }
    const ends: LocalPoint[] = [
      { u: across / 2, v: 0.8 },
      { u: across / 2, v: along - 0.8 },
    ];
    const middle = receivers.map((_, i) => ({
      u: across / 2,
      v: along * (receivers.length > 1 ? 0.38 + 0.24 * i : 0.5),
    }));
    return {
      essential: [...gateAcross(across / 2, along / 2, Math.min(across - 1, 3)), ...ends],
      outline: corners(across, along),
      extra: [],
      positions: [
        ...place(servers, ends, 'server'),
        ...coachAt(station, ends[Math.min(1, servers.length)]),
        ...place(receivers, middle, 'attacker'),
      ],
    };
  },
};
