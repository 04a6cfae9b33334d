/** Tag games: chasing and dribbling games in a grid, every child with a ball where there are balls. */
import '../../shared/i18n/localize';
import type { KindModule, LocalZone } from './kind-module';
import {
  ballNeed,
  circle,
  corners,
  groupCount,
  place,
  setUp,
  spread,
  tableSizes,
  waitingFor,
} from './common';

/** About one tagger for every five players, one to three. */
export function taggerCount(players: number): number {
  return Math.max(1, Math.min(3, Math.round(players / 5)));
}

export const tagGame: KindModule = {
  kind: 'tag-game',
  layouts: [
    setUp(
      'grid',
      () => $localize`:set-up of an activity, how it is laid out:A square grid, taggers start in the middle`,
    ),
    setUp(
      'safe-corners',
      () =>
        $localize`:set-up of an activity, how it is laid out:A grid with a small safe zone in each corner`,
    ),
  ],
  facesShots: false,
  targets: () => ({ ends: 0, keepers: false }),
  sizes: (params, level, _band, activity) => tableSizes(params, 'tag-game', level, activity),
  roles: ({ players }) => {
    const ids = players.map((p) => p.id);
    const taggers = ids.slice(ids.length - taggerCount(ids.length));
    const runners = ids.slice(0, ids.length - taggers.length);
    return {
      roles: { attackers: runners, defenders: taggers, rotation: [...taggers, ...runners] },
      format:
        taggers.length === 1
          ? $localize`:station format in a coach's shorthand, chasers and the players they chase:1 tagger, ${runners.length}:runners: running`
          : $localize`:station format in a coach's shorthand, chasers and the players they chase:${taggers.length}:taggers: taggers, ${runners.length}:runners: running`,
      points: [
        $localize`:coaching point that follows from the roles:Change the taggers every minute or so, so everyone chases and everyone escapes`,
      ],
    };
  },
  balls: (activity, station) => ballNeed(activity.balls, groupCount(station), 1),
  bibs: (station) => station.roles.defenders?.length ?? 0,
  waiting: (station, activity) => waitingFor(station, activity),
  draw: ({ across, along }, station, layout) => {
    const taggers = station.roles.defenders ?? [];
    const runners = station.playerIds.filter((id) => !taggers.includes(id));
    const r = Math.min(across, along) * 0.1;
    const zones: LocalZone[] = [];
    const extra = [];
    if (layout === 'safe-corners') {
      const safe = $localize`:words drawn in a corner zone of a tag game where nobody can be tagged:safe`;
      const s = Math.max(2, Math.min(4, Math.min(across, along) / 5));
      for (const [u, v] of [
        [0, 0],
        [across - s, 0],
        [across - s, along - s],
        [0, along - s],
      ]) {
        zones.push({ u, v, across: s, along: s, label: safe });
      }
      extra.push(
        { u: s, v: s },
        { u: across - s, v: s },
        { u: across - s, v: along - s },
        { u: s, v: along - s },
      );
    }
    return {
      essential: [],
      outline: corners(across, along),
      extra,
      zones,
      positions: [
        ...place(
          taggers,
          circle(taggers.length, across / 2, along / 2, taggers.length > 1 ? r : 0),
          'defender',
        ),
        ...place(runners, spread(runners.length, across, along, 1.5), 'player'),
      ],
    };
  },
};
