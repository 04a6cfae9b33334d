/** Helpers the kind modules share: default sizes, balls and waiting by ball use, and point layouts. */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  BallUse,
  Level,
  RuleParameters,
  Station,
  StationKind,
} from '../../shared/types';
import { intersectRange, type SizeRule } from '../planning/size-rule';
import type { BallNeed, KindLayout, LocalPoint, LocalPosition } from './kind-module';

/**
 * A set-up with its words read on each use (`words` returns a `$localize` message), so the server
 * says them in the reader's language rather than the one it started in.
 */
export function setUp(id: string, words: () => string): KindLayout {
  return {
    id,
    get label() {
      return words();
    },
  };
}

/** Two sides' numbers in a coach's shorthand: "3v3". */
export function sides(a: number, b: number): string {
  return $localize`:station format, players of one side against the other, e.g. 3v3:${a}:sideA:v${b}:sideB:`;
}

/** Two sides and, with an odd number, a neutral: "3v3", "3v3 + 1 neutral". */
export function sidesWithNeutral(a: number, b: number, neutral: boolean): string {
  return neutral
    ? $localize`:station format, two sides and one neutral player, e.g. 3v3 + 1 neutral:${a}:sideA:v${b}:sideB: + 1 neutral`
    : sides(a, b);
}

/** Two sides' outfield players, "+ goalkeepers" when they have them: "3v3 + goalkeepers". */
export function sidesWithKeepers(a: number, b: number, keepers: boolean): string {
  return keepers
    ? $localize`:station format in a coach's shorthand, two sides and their goalkeepers:${a}:sideA:v${b}:sideB: + goalkeepers`
    : sides(a, b);
}

/** The coaching point a neutral player brings. */
export function neutralPoint(): string {
  return $localize`:coaching point for a station with a neutral player:The neutral plays for whichever side has the ball`;
}

/** The club's group sizes for the kind and level, narrowed to the activity's player range. */
export function tableSizes(
  params: RuleParameters,
  kind: StationKind,
  level: Level,
  activity: ActivityDefinition,
): SizeRule | null {
  return intersectRange(params.groupSizes[kind][level], activity.players);
}

/** Everyone in the group, a joining coach included (they take a ball and a place too). */
export function groupCount(station: Pick<Station, 'playerIds' | 'coachJoins'>): number {
  return station.playerIds.length + station.coachJoins;
}

/** Balls for nobody to wait, by how the activity uses them; `perGroup` for `group` activities. */
export function ballNeed(use: BallUse, count: number, perGroup: number, spare = 0): BallNeed {
  switch (use) {
    case 'each':
      return { needed: count, spare: 0 };
    case 'pair':
      // One per pair; when balls are short a third joins a pair (shadowing, passing on), so
      // what nobody-waits needs is one per three.
      return { needed: Math.ceil(count / 3), spare: Math.ceil(count / 2) - Math.ceil(count / 3) };
    case 'group':
      return { needed: perGroup, spare };
    case 'none':
      return { needed: 0, spare: 0 };
  }
}

/**
 * Players who cannot be active at once: those beyond the places (`placesWaiting`) or, when the
 * balls run short, those without one (a ball each, or one per pair); a group activity with no
 * ball at all has everyone waiting.
 */
export function waitingByBalls(use: BallUse, count: number, balls: number, placesWaiting = 0): number {
  let short = 0;
  if (use === 'each') short = Math.max(0, count - balls);
  else if (use === 'pair') short = Math.max(0, count - 3 * balls);
  else if (use === 'group') short = balls > 0 ? 0 : count;
  return Math.max(placesWaiting, short);
}

/** The station's two sides and each side's outfield players (its goalkeepers stand in goal). */
export function sidesOf(station: Pick<Station, 'roles'>): {
  a: string[];
  b: string[];
  outA: string[];
  outB: string[];
  keepers: string[];
} {
  const keepers = station.roles.goalkeeper ?? [];
  const [a, b] = station.roles.teams ?? [[], []];
  return {
    a,
    b,
    outA: a.filter((id) => !keepers.includes(id)),
    outB: b.filter((id) => !keepers.includes(id)),
    keepers,
  };
}

/** Goalkeepers in the station (in goal) are not outfield players. */
export function outfieldIds(station: Pick<Station, 'playerIds' | 'roles'>): string[] {
  const keepers = station.roles.goalkeeper ?? [];
  return keepers.length ? station.playerIds.filter((id) => !keepers.includes(id)) : station.playerIds;
}

export function waitingFor(station: Station, activity: ActivityDefinition, placesWaiting = 0): number {
  return waitingByBalls(
    activity.balls,
    outfieldIds(station).length + station.coachJoins,
    station.equipment.balls,
    placesWaiting,
  );
}

/** n points evenly along a line across the frame at `v`, inset from the sides. */
export function row(n: number, v: number, across: number, inset = 1): LocalPoint[] {
  const usable = Math.max(0, across - 2 * inset);
  return Array.from({ length: n }, (_, i) => ({ u: inset + (usable * (i + 0.5)) / Math.max(n, 1), v }));
}

/** n points spread over a rectangle in rows, roughly square cells, inset from the edges. */
export function spread(n: number, across: number, along: number, inset = 1, v0 = 0): LocalPoint[] {
  if (n <= 0) return [];
  const w = Math.max(0.5, across - 2 * inset);
  const l = Math.max(0.5, along - 2 * inset);
  const cols = Math.max(1, Math.round(Math.sqrt((n * w) / l)));
  const rows = Math.ceil(n / cols);
  const out: LocalPoint[] = [];
  for (let r = 0; r < rows; r++) {
    const inRow = Math.min(cols, n - r * cols);
    // Alternate rows shift half a cell, so players do not stand in straight files.
    const shift = r % 2 ? 0.25 : -0.25;
    for (let c = 0; c < inRow; c++) {
      const fu = (c + 0.5 + (inRow > 1 ? shift : 0)) / inRow;
      out.push({ u: inset + w * clamp01(fu), v: v0 + inset + (l * (r + 0.5)) / rows });
    }
  }
  return out;
}

/** n points round the inside of the rectangle's edge, starting near the near-left corner. */
export function perimeter(n: number, across: number, along: number, inset = 1): LocalPoint[] {
  const w = Math.max(0.5, across - 2 * inset);
  const l = Math.max(0.5, along - 2 * inset);
  const total = 2 * (w + l);
  return Array.from({ length: n }, (_, i) => {
    let d = ((i + 0.5) / Math.max(n, 1)) * total;
    if (d < w) return { u: inset + d, v: inset };
    d -= w;
    if (d < l) return { u: inset + w, v: inset + d };
    d -= l;
    if (d < w) return { u: inset + w - d, v: inset + l };
    d -= w;
    return { u: inset, v: inset + l - d };
  });
}

/** n points on a circle. */
export function circle(n: number, cu: number, cv: number, radius: number): LocalPoint[] {
  return Array.from({ length: n }, (_, i) => {
    const a = (2 * Math.PI * i) / Math.max(n, 1) - Math.PI / 2;
    return { u: cu + radius * Math.cos(a), v: cv + radius * Math.sin(a) };
  });
}

/** The four corners of the frame. */
export function corners(across: number, along: number): LocalPoint[] {
  return [
    { u: 0, v: 0 },
    { u: across, v: 0 },
    { u: across, v: along },
    { u: 0, v: along },
  ];
}

/** Two cones a gate's width apart across the frame at (u, v). */
export function gateAcross(u: number, v: number, width: number): LocalPoint[] {
  return [
    { u: u - width / 2, v },
    { u: u + width / 2, v },
  ];
}

/** Positions for ids at points, in order (points may be fewer: the rest go to the last point). */
export function place(ids: string[], points: LocalPoint[], role: LocalPosition['role']): LocalPosition[] {
  return ids.map((id, i) => {
    const p = points[Math.min(i, points.length - 1)] ?? { u: 0, v: 0 };
    return { id, role, u: p.u, v: p.v };
  });
}

/** A joining coach's position, when there is one. */
/**
 * Each side's goalkeeper on their own goal line: side A's at the near end, side B's at the far end
 * of an area `across` wide and `along` long (games with a goal at each end).
 */
export function keepersInGoals(
  a: string[],
  b: string[],
  keepers: string[],
  across: number,
  along: number,
): LocalPosition[] {
  return [
    ...place(
      a.filter((id) => keepers.includes(id)),
      [{ u: across / 2, v: 0.6 }],
      'goalkeeper',
    ),
    ...place(
      b.filter((id) => keepers.includes(id)),
      [{ u: across / 2, v: along - 0.6 }],
      'goalkeeper',
    ),
  ];
}

export function coachAt(station: Pick<Station, 'coachJoins'>, point: LocalPoint): LocalPosition[] {
  return station.coachJoins ? [{ id: 'coach', role: 'coach', u: point.u, v: point.v }] : [];
}

/** Splits ids into two sides as evenly as possible, keepers first on each side. */
/** Two sides with a goalkeeper each where there are keepers, and the format a coach writes ("4v4 + goalkeepers"). */
export function sidesWithTheirKeepers(
  ids: string[],
  keepers: string[],
): { teams: [string[], string[]]; format: string } {
  const teams = twoSides(ids, keepers);
  const out = (side: string[]) => side.filter((id) => !keepers.includes(id)).length;
  return { teams, format: sidesWithKeepers(out(teams[0]), out(teams[1]), keepers.length > 0) };
}

export function twoSides(ids: string[], keepers: string[]): [string[], string[]] {
  const a: string[] = [];
  const b: string[] = [];
  keepers.slice(0, 2).forEach((id, i) => (i === 0 ? a : b).push(id));
  for (const id of ids) {
    if (keepers.includes(id)) continue;
    const aOut = a.filter((x) => !keepers.includes(x)).length;
    const bOut = b.filter((x) => !keepers.includes(x)).length;
    (aOut <= bOut ? a : b).push(id);
  }
  return [a, b];
}

function clamp01(x: number): number {
  return Math.min(0.98, Math.max(0.02, x));
}
