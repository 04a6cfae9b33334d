/** Directional possession: two sides keep the ball and score by getting it into an end zone or through a gate. */
import '../../shared/i18n/localize';
import type { KindModule } from './kind-module';
import {
  ballNeed,
  corners,
  groupCount,
  neutralPoint,
  place,
  setUp,
  sidesWithNeutral,
  spread,
  tableSizes,
  waitingFor,
} from './common';

export const directionalPossession: KindModule = {
  kind: 'directional-possession',
  layouts: [
    setUp(
      'end-zones',
      () =>
        $localize`:set-up of an activity, how it is laid out:Two sides; score by receiving the ball in the end zone`,
    ),
    setUp(
      'gates',
      () =>
        $localize`:set-up of an activity, how it is laid out:Two sides; score through one of the gates on the end line`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'directional-possession', level, activity),
  roles: ({ players }) => {
    const ids = players.map((p) => p.id);
    const neutral = ids.length % 2 ? [ids[ids.length - 1]] : [];
    const rest = ids.slice(0, ids.length - neutral.length);
    const a = rest.filter((_, i) => i % 2 === 0);
    const b = rest.filter((_, i) => i % 2 === 1);
    return {
      roles: { teams: [a, b], neutrals: neutral },
      format: sidesWithNeutral(a.length, b.length, neutral.length > 0),
      points: neutral.length ? [neutralPoint()] : undefined,
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1, 2),
  bibs: (station) => station.roles.teams?.[0].length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const [a, b] = station.roles.teams ?? [[], []];
    const neutrals = station.roles.neutrals ?? [];
    const depth = Math.max(2, Math.min(5, along * 0.15));
    const positions = [
      ...place(a, spread(a.length, across, along / 2 - depth, 1, depth), 'team-a'),
      ...place(b, spread(b.length, across, along / 2 - depth, 1, along / 2), 'team-b'),
      ...place(neutrals, [{ u: across / 2, v: along / 2 }], 'neutral'),
    ];
    if (layout === 'gates') {
      return {
        essential: [],
        outline: corners(across, along),
        extra: [],
        gates: [
          { u: across * 0.25, v: 0, edge: 'near' },
          { u: across * 0.75, v: 0, edge: 'near' },
          { u: across * 0.25, v: along, edge: 'far' },
          { u: across * 0.75, v: along, edge: 'far' },
        ],
        positions,
      };
    }
    const endZone = $localize`:words drawn in a zone of a station diagram, where players score:end zone`;
    return {
      essential: [
        { u: 0, v: depth },
        { u: across, v: depth },
        { u: 0, v: along - depth },
        { u: across, v: along - depth },
      ],
      outline: corners(across, along),
      extra: [],
      zones: [
        { u: 0, v: 0, across, along: depth, label: endZone },
        { u: 0, v: along - depth, across, along: depth, label: endZone },
      ],
      positions,
    };
  },
};
