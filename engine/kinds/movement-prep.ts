/** Movement preparation for U13 and older: travelling movements in lanes, building to accelerations. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import { ballNeed, groupCount, place, row, setUp, tableSizes, waitingFor } from './common';

export const movementPrep: KindModule = {
  kind: 'movement-prep',
  layouts: [
    setUp(
      'lanes',
      () => $localize`:set-up of an activity, how it is laid out:Lanes marked at both ends: out and back`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'movement-prep', level, activity),
  roles: ({ players }) => {
    const lanes = laneCount(players.length);
    return {
      roles: {},
      format:
        lanes === 1
          ? $localize`:station format in a coach's shorthand, lanes that go one after another:1 lane, going in waves`
          : $localize`:station format in a coach's shorthand, lanes that go one after another:${lanes}:lanes: lanes, going in waves`,
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station) => {
    const lanes = laneCount(station.playerIds.length);
    const starts = row(lanes, 0, across, 1);
    const essential: LocalPoint[] = starts.flatMap((s) => [s, { u: s.u, v: along }]);
    const stand = station.playerIds.map((_, i) => {
      const s = starts[i % lanes];
      return { u: s.u, v: 0.8 + Math.floor(i / lanes) * 1.2 };
    });
    return {
      essential,
      outline: [],
      extra: [],
      positions: place(station.playerIds, stand, 'player'),
    };
  },
};

/** About three players to a lane, at most eight lanes. */
function laneCount(players: number): number {
  return Math.max(1, Math.min(8, Math.ceil(players / 3)));
}
