/** Transition: attack against defence, and the moment the ball changes hands. */
import '../../shared/i18n/localize';
import type { KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  groupCount,
  place,
  setUp,
  tableSizes,
  waitingFor,
  sidesOf,
  sidesWithTheirKeepers,
  keepersInGoals,
} from './common';
import { spreadAcross } from './shooting-game';

export const transition: KindModule = {
  kind: 'transition',
  layouts: [
    setUp(
      'waves',
      () =>
        $localize`:set-up of an activity, how it is laid out:Attackers go at a goal; defenders who win it counter through the gates`,
    ),
    setUp(
      'two-goals',
      () =>
        $localize`:set-up of an activity, how it is laid out:Two sides, two goals; switch from attack to defence the moment the ball is lost`,
    ),
  ],
  facesShots: true,
  targets: (layout) => (layout === 'two-goals' ? { ends: 2, keepers: true } : { ends: 1, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'transition', level, activity),
  roles: ({ players, keepers }) => {
    const ids = players.map((p) => p.id);
    const { teams, format } = sidesWithTheirKeepers(ids, keepers);
    return { roles: { teams, goalkeeper: keepers }, format };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 3),
  bibs: (station) => station.roles.teams?.[0].length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const { a, b, outA, outB, keepers } = sidesOf(station);
    const positions = [
      ...place(outA, spreadAcross(outA.length, along * 0.3, across), 'team-a'),
      ...place(outB, spreadAcross(outB.length, along * 0.7, across), 'team-b'),
      ...keepersInGoals(a, b, keepers, across, along),
    ];
    return {
      essential: [],
      outline: corners(across, along),
      extra: [],
      gates:
        layout === 'two-goals'
          ? []
          : [
              { u: across * 0.25, v: 0, edge: 'near' },
              { u: across * 0.75, v: 0, edge: 'near' },
            ],
      positions,
    };
  },
};
