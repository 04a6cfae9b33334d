/** Speed: short, sharp reaction and sprint races in lanes, with full rest between goes. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import { ballNeed, coachAt, groupCount, place, row, setUp, tableSizes, waitingFor } from './common';

export const speed: KindModule = {
  kind: 'speed',
  layouts: [
    setUp(
      'lanes',
      () => $localize`:set-up of an activity, how it is laid out:Pairs race side by side in lanes`,
    ),
    setUp(
      'race-to-ball',
      () =>
        $localize`:set-up of an activity, how it is laid out:A ball between two players: race to win it and dribble over the line`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'speed', level, activity),
  roles: ({ players, coachJoins }) => {
    const total = players.length + coachJoins;
    const lanes = Math.max(1, Math.floor(total / 2));
    return {
      roles: {},
      format: lanesOf(lanes, total % 2 === 1),
      points: [
        $localize`:coaching point that follows from the roles:Full rest between races: walk back, then go again`,
      ],
    };
  },
  balls: (activity, station) =>
    ballNeed(activity.balls, groupCount(station), Math.max(1, Math.floor(groupCount(station) / 2))),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const total = station.playerIds.length + station.coachJoins;
    const lanes = Math.max(1, Math.floor(total / 2));
    const centres = row(lanes, 0, across, 0.5);
    const essential: LocalPoint[] = centres.flatMap((c) => [
      { u: c.u, v: 0 },
      { u: c.u, v: along },
    ]);
    const extra = layout === 'race-to-ball' ? centres.map((c) => ({ u: c.u, v: along / 2 })) : [];
    // A pair stands side by side in its lane, far enough apart to be told apart on a diagram
    // (a quarter of the lane either side of its middle, at most 1.5 m); a third waits between them.
    const apart = Math.min(across / lanes / 4, 1.5);
    const stand = Array.from({ length: total }, (_, i) => {
      const c = centres[Math.min(Math.floor(i / 2), lanes - 1)]!;
      if (i >= lanes * 2) return { u: c.u, v: 0.2 };
      return { u: c.u + (i % 2 === 0 ? -apart : apart), v: 1 };
    });
    return {
      essential,
      outline: [],
      extra,
      positions: [
        ...place(station.playerIds, stand, 'player'),
        ...coachAt(station, stand[station.playerIds.length] ?? centres[0]),
      ],
    };
  },
};

/** "3 lanes of 2", "3 lanes of 2–3" when one lane races three. */
function lanesOf(lanes: number, three: boolean): string {
  if (lanes === 1)
    return three
      ? $localize`:station format in a coach's shorthand, racing lanes, one of them with three players:1 lane of 2–3`
      : $localize`:station format in a coach's shorthand, racing lanes of two players:1 lane of 2`;
  return three
    ? $localize`:station format in a coach's shorthand, racing lanes, one of them with three players:${lanes}:lanes: lanes of 2–3`
    : $localize`:station format in a coach's shorthand, racing lanes of two players:${lanes}:lanes: lanes of 2`;
}
