/** Passing and finishing in threes: pass round a triangle, the third drives at goal and shoots. */
import '../../shared/i18n/localize';
import type { KindModule, LocalPoint } from './kind-module';
import {
  ballNeed,
  coachAt,
  corners,
  groupCount,
  outfieldIds,
  place,
  setUp,
  tableSizes,
  waitingFor,
} from './common';

/** Outfield players who can be busy at once in a group of three roles. */
const ACTIVE = 3;

export const passingFinishing: KindModule = {
  kind: 'passing-finishing',
  layouts: [
    setUp(
      'triangle',
      () =>
        $localize`:set-up of an activity, how it is laid out:Pass round a triangle; the third player drives at goal and shoots`,
    ),
    setUp(
      'set-and-shoot',
      () => $localize`:set-up of an activity, how it is laid out:Pass in, lay it back, shoot first time`,
    ),
  ],
  facesShots: true,
  targets: () => ({ ends: 1, keepers: true }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'passing-finishing', level, activity),
  roles: ({ players, keepers, coachJoins }) => {
    const outfield = players.map((p) => p.id).filter((id) => !keepers.includes(id));
    const n = outfield.length + coachJoins;
    return {
      roles: { goalkeeper: keepers, rotation: outfield },
      format: keepers.length
        ? $localize`:station format in a coach's shorthand, players shooting at a goalkeeper:${n}:players: + goalkeeper`
        : $localize`:station format in a coach's shorthand, players shooting at a goal with nobody in it:${n}:players: + an empty goal`,
      points: keepers.length
        ? [
            $localize`:coaching point that follows from the roles:Shooters: hit the target first; the goalkeeper sets the pace between shots`,
          ]
        : undefined,
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 2),
  bibs: () => 0,
  waiting: (station, activity) =>
    waitingFor(station, activity, Math.max(0, outfieldIds(station).length + station.coachJoins - ACTIVE)),
  draw: ({ across, along }, station, layout) => {
    const outfield = outfieldIds(station);
    const keepers = station.roles.goalkeeper ?? [];
    const spots: LocalPoint[] =
      layout === 'set-and-shoot'
        ? [
            { u: across * 0.35, v: along * 0.15 },
            { u: across * 0.5, v: along * 0.55 },
            { u: across * 0.65, v: along * 0.15 },
          ]
        : [
            { u: across * 0.25, v: along * 0.15 },
            { u: across * 0.75, v: along * 0.15 },
            { u: across * 0.5, v: along * 0.45 },
          ];
    const stand = Array.from({ length: outfield.length + station.coachJoins }, (_, i) =>
      i < spots.length ? spots[i] : { u: spots[0].u - 1, v: Math.max(0.3, spots[0].v - 1) },
    );
    return {
      essential: spots,
      outline: corners(across, along),
      extra: [],
      positions: [
        ...place(outfield, stand, 'attacker'),
        ...coachAt(station, stand[outfield.length] ?? spots[0]),
        ...place(keepers, [{ u: across / 2, v: along - 0.6 }], 'goalkeeper'),
      ],
    };
  },
};
