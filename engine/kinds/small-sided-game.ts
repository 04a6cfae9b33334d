/** Small-sided games: even sides within the age's format, a goalkeeper each side or none. */
import '../../shared/i18n/localize';
import { rangeRule } from '../planning/size-rule';
import type { KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  groupCount,
  place,
  setUp,
  sides,
  spread,
  tableSizes,
  twoSides,
  waitingFor,
  sidesOf,
  keepersInGoals,
} from './common';

export const smallSidedGame: KindModule = {
  kind: 'small-sided-game',
  layouts: [
    setUp(
      'goals',
      () => $localize`:set-up of an activity, how it is laid out:Two goals (or gates), one at each end`,
    ),
    setUp(
      'end-lines',
      () => $localize`:set-up of an activity, how it is laid out:Score by stopping the ball on the end line`,
    ),
    setUp(
      'four-gates',
      () => $localize`:set-up of an activity, how it is laid out:Two gates at each end to attack`,
    ),
  ],
  facesShots: true,
  targets: (layout) =>
    layout === 'goals' || !layout ? { ends: 2, keepers: true } : { ends: 0, keepers: false },
  sizes: (params, level, band, activity) => {
    const table = tableSizes(params, 'small-sided-game', level, activity);
    if (!table) return null;
    // Groups count outfield players: a side's keeper is added to them, so the format's size
    // (keepers included, US Soccer 2016) is one fewer outfield player a side where keepers play.
    const format = params.gameFormats[band];
    const min = Math.max(table.min, 2 * format.minPerSide);
    const max = Math.min(table.max, 2 * (format.maxPerSide - (format.goalkeepers ? 1 : 0)));
    return min <= max ? rangeRule(min, table.preferred, max) : null;
  },
  roles: ({ players, keepers }) => {
    const teams = twoSides(
      players.map((p) => p.id),
      keepers,
    );
    return {
      roles: { teams, goalkeeper: keepers },
      format: keepers.length
        ? $localize`:station format in a coach's shorthand, a game between two sides with a goalkeeper each:${teams[0].length}:sideA:v${teams[1].length}:sideB: with goalkeepers`
        : sides(teams[0].length, teams[1].length),
      points: keepers.length
        ? [
            $localize`:coaching point that follows from the roles:Goalkeepers start every attack with a throw or a pass along the ground`,
          ]
        : undefined,
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 3),
  bibs: (station) => station.roles.teams?.[0].length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const { a, b, outA, outB, keepers } = sidesOf(station);
    return {
      essential: [],
      outline: corners(across, along),
      extra: [
        { u: 0, v: along / 2 },
        { u: across, v: along / 2 },
      ],
      gates:
        layout === 'four-gates'
          ? [
              { u: across * 0.2, v: 0, edge: 'near' },
              { u: across * 0.8, v: 0, edge: 'near' },
              { u: across * 0.2, v: along, edge: 'far' },
              { u: across * 0.8, v: along, edge: 'far' },
            ]
          : [],
      lines: [
        {
          from: { u: 0, v: along / 2 },
          to: { u: across, v: along / 2 },
          label: $localize`:words drawn on the halfway line of a station diagram:halfway`,
        },
      ],
      positions: [
        ...keepersInGoals(a, b, keepers, across, along),
        ...place(outA, spread(outA.length, across, along / 2 - 1, 1.5, 0.5), 'team-a'),
        ...place(outB, spread(outB.length, across, along / 2 - 1, 1.5, along / 2 + 0.5), 'team-b'),
      ],
    };
  },
};
