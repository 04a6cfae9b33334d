/** Ball-mastery: every player on the ball, touch challenges while travelling. */
import '../../shared/i18n/localize';
import type { KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  gateAcross,
  groupCount,
  place,
  row,
  setUp,
  spread,
  tableSizes,
  waitingFor,
} from './common';

export const ballMastery: KindModule = {
  kind: 'ball-mastery',
  layouts: [
    setUp(
      'grid',
      () =>
        $localize`:set-up of an activity, how it is laid out:A square grid with a few gates to dribble through`,
    ),
    setUp(
      'lanes',
      () =>
        $localize`:set-up of an activity, how it is laid out:Lanes: travel from line to line across the grid`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'ball-mastery', level, activity),
  roles: ({ activity }) => ({
    roles: {},
    format:
      activity.balls === 'pair'
        ? $localize`:station format in a coach's shorthand, balls shared:in pairs (threes when balls are short)`
        : activity.balls === 'each'
          ? $localize`:station format in a coach's shorthand, every player has a ball:a ball each`
          : '',
  }),
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const n = station.playerIds.length;
    if (layout === 'lanes') {
      const lanes = Math.max(1, Math.min(n, 6));
      const ends = row(lanes, 0, across, 1).flatMap((p) => [p, { u: p.u, v: along }]);
      return {
        essential: ends,
        outline: [],
        extra: [],
        positions: place(
          station.playerIds,
          Array.from({ length: n }, (_, i) => {
            const lane = row(lanes, 0, across, 1)[i % lanes];
            return { u: lane.u, v: 1 + Math.floor(i / lanes) * 1.5 };
          }),
          'player',
        ),
      };
    }
    const gates = Math.max(2, Math.min(4, Math.floor(n / 2)));
    const gatePoints = spread(gates, across, along, Math.min(across, along) * 0.22).flatMap((p) =>
      gateAcross(p.u, p.v, 1.5),
    );
    return {
      essential: [],
      outline: corners(across, along),
      extra: gatePoints,
      positions: place(station.playerIds, spread(n, across, along, 1.2), 'player'),
    };
  },
};
