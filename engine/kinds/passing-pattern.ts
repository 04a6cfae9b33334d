/** Passing patterns: pairs through gates, triangles and squares, pass and follow. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import {
  ballNeed,
  coachAt,
  corners,
  gateAcross,
  groupCount,
  place,
  row,
  setUp,
  tableSizes,
  waitingFor,
} from './common';

export const passingPattern: KindModule = {
  kind: 'passing-pattern',
  layouts: [
    setUp(
      'pairs',
      () => $localize`:set-up of an activity, how it is laid out:Pairs pass through a gate across a channel`,
    ),
    setUp(
      'triangle',
      () =>
        $localize`:set-up of an activity, how it is laid out:A triangle of cones: pass and follow your pass`,
    ),
    setUp(
      'square',
      () => $localize`:set-up of an activity, how it is laid out:A square of cones with a give-and-go`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'passing-pattern', level, activity),
  roles: ({ players, layout, coachJoins }) => {
    const ids = players.map((p) => p.id);
    const total = ids.length + coachJoins;
    // An odd number makes one three: 5 is a pair and a three, 7 two pairs and a three.
    const pairs = Math.floor(total / 2) - (total % 2 && total > 1 ? 1 : 0);
    const format =
      layout === 'pairs'
        ? pairsFormat(pairs, total % 2 === 1 && total > 1)
        : layout === 'triangle'
          ? $localize`:station format in a coach's shorthand, players round a triangle of cones:triangle of ${total}:players:`
          : $localize`:station format in a coach's shorthand, players round a square of cones:square of ${total}:players:`;
    return { roles: {}, format };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 1),
  bibs: () => 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const ids = station.playerIds;
    const total = ids.length + station.coachJoins;
    if (layout === 'triangle' || layout === 'square') {
      const spots: LocalPoint[] =
        layout === 'triangle'
          ? [
              { u: across * 0.2, v: along * 0.2 },
              { u: across * 0.8, v: along * 0.2 },
              { u: across * 0.5, v: along * 0.8 },
            ]
          : [
              { u: across * 0.15, v: along * 0.15 },
              { u: across * 0.85, v: along * 0.15 },
              { u: across * 0.85, v: along * 0.85 },
              { u: across * 0.15, v: along * 0.85 },
            ];
      // Extra players stand just behind a cone and go next.
      const stand = Array.from({ length: total }, (_, i) => {
        const s = spots[i % spots.length];
        return i < spots.length ? s : { u: s.u, v: Math.max(0.3, s.v - 1.2) };
      });
      return {
        essential: spots,
        outline: [],
        extra: [],
        positions: [...place(ids, stand, 'player'), ...coachAt(station, stand[ids.length] ?? spots[0])],
      };
    }
    const pairs = Math.max(1, Math.floor(total / 2));
    const lanes = row(pairs, along / 2, across, 1);
    const gates = lanes.flatMap((p) => gateAcross(p.u, p.v, Math.min(2, across / pairs - 0.5)));
    const stand = Array.from({ length: total }, (_, i) => {
      const lane = lanes[Math.min(Math.floor(i / 2), pairs - 1)];
      const third = i >= pairs * 2;
      return { u: lane.u + (third ? 0.9 : 0), v: i % 2 === 0 || third ? 1 : along - 1 };
    });
    return {
      essential: gates,
      outline: corners(across, along),
      extra: [],
      positions: [...place(ids, stand, 'player'), ...coachAt(station, stand[ids.length] ?? lanes[0])],
    };
  },
};

/** "3 pairs", "2 pairs and a three", "a three". */
function pairsFormat(pairs: number, three: boolean): string {
  if (!three)
    return pairs === 1
      ? $localize`:station format in a coach's shorthand, passing in twos:1 pair`
      : $localize`:station format in a coach's shorthand, passing in twos:${pairs}:pairs: pairs`;
  if (!pairs) return $localize`:station format in a coach's shorthand, one group of three passing:a three`;
  return pairs === 1
    ? $localize`:station format in a coach's shorthand, passing in twos and one group of three:1 pair and a three`
    : $localize`:station format in a coach's shorthand, passing in twos and one group of three:${pairs}:pairs: pairs and a three`;
}
