/** Cool-down for U13 and older: easy movement, light passing, stretching and a short talk. */
import '../../shared/i18n/localize';
import type { KindModule } from './kind-module';
import { ballNeed, circle, coachAt, groupCount, place, setUp, tableSizes, waitingFor } from './common';

export const coolDown: KindModule = {
  kind: 'cool-down',
  layouts: [
    setUp(
      'circle',
      () => $localize`:set-up of an activity, how it is laid out:A circle, the coach in the middle`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'cool-down', level, activity),
  roles: () => ({
    roles: {},
    format: $localize`:station format in a coach's shorthand, the whole group at once:everyone together`,
  }),
  balls: (activity, station) =>
    ballNeed(activity.balls, groupCount(station), Math.ceil(groupCount(station) / 4)),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station) => {
    const r = Math.max(1, Math.min(across, along) * 0.38);
    return {
      essential: [],
      outline: [],
      extra: [],
      positions: [
        ...place(station.playerIds, circle(station.playerIds.length, across / 2, along / 2, r), 'player'),
        ...coachAt(station, { u: across / 2, v: along / 2 }),
      ],
    };
  },
};
