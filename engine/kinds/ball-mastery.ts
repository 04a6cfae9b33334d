/** Ball-mastery: every player on the ball, touch challenges while travelling. */
import type { KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  gateAcross,
  groupCount,
  place,
  row,
  spread,
  tableSizes,
  waitingFor,
} from './common';

export const ballMastery: KindModule = {
  kind: 'ball-mastery',
  layouts: [
    { id: 'grid', label: 'A square grid with a few gates to dribble through' },
    { id: 'lanes', label: 'Lanes: travel from line to line across the grid' },
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'ball-mastery', level, activity),
  roles: ({ activity }) => ({
    roles: {},
    format:
      activity.balls === 'pair'
        ? 'in pairs (threes when balls are short)'
        : activity.balls === 'each'
          ? 'a ball each'
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
