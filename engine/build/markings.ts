/**
 * Goals, cone gates and cone positions for a phase's stations: targets face away from
 * neighbouring stations, goals go first to finishing, cones first to gates, then to each
 * activity's essentials, then corners, then extras — never more than the bag holds.
 */
import type {
  ActivityKind,
  GoalPlacement,
  Notice,
  Point,
  RuleParameters,
  Space,
  Station,
} from '../../shared/types';
import { round1, type Rect } from '../geometry';

type Direction = 'N' | 'S' | 'E' | 'W';

const FACING: Record<Direction, number> = { N: 180, S: 0, E: 270, W: 90 };
const GOAL_PRIORITY: ActivityKind[] = ['passing-finishing', 'small-sided-game', 'keep-ball'];

interface Target {
  /** Index of the station in the phase. */
  index: number;
  direction: Direction;
  kind: 'goal' | 'gate' | 'none';
}

// Shared, never mutated: the two ends along a station's long or short side, and all four in the
// order a single target looks for room (long sides first).
const NS: readonly Direction[] = ['N', 'S'];
const EW: readonly Direction[] = ['E', 'W'];
const NSEW: readonly Direction[] = ['N', 'S', 'E', 'W'];
const EWNS: readonly Direction[] = ['E', 'W', 'N', 'S'];

export function markPhase(
  stations: Station[],
  space: Space,
  params: RuleParameters,
  kit: { cones: number; goals: number },
  warnings: Notice[],
  phaseName: string,
): void {
  const rects = stations.map(rectOfStation);
  const targets: Target[] = [];
  const byStation: Target[][] = stations.map(() => []);
  const corridorHalf = params.layout.gateWidthM / 2 + 2;
  let shotsBlocked = false;

  stations.forEach((station, i) => {
    const rule = params.kinds[station.activityKind].goals;
    if (rule === 'none') return;
    const r = rects[i];
    const lengthways = r.length >= r.width;
    const long = lengthways ? NS : EW;
    const short = lengthways ? EW : NS;
    let chosen: readonly Direction[];
    let clearance: number;
    if (rule === 'two') {
      const a = Math.min(
        clearanceOf(r, long[0], rects, i, corridorHalf),
        clearanceOf(r, long[1], rects, i, corridorHalf),
      );
      const b = Math.min(
        clearanceOf(r, short[0], rects, i, corridorHalf),
        clearanceOf(r, short[1], rects, i, corridorHalf),
      );
      chosen = b > a ? short : long;
      clearance = Math.max(a, b);
    } else {
      let best: Direction = long[0];
      let bestClear = -1;
      for (const d of lengthways ? NSEW : EWNS) {
        const c = clearanceOf(r, d, rects, i, corridorHalf);
        if (c > bestClear) {
          best = d;
          bestClear = c;
        }
      }
      chosen = [best];
      clearance = bestClear;
    }
    const shoots = station.activityKind !== 'keep-ball';
    if (shoots && clearance < params.layout.shotClearanceM && Number.isFinite(clearance)) shotsBlocked = true;
    for (const d of chosen) {
      const target: Target = { index: i, direction: d, kind: 'none' };
      targets.push(target);
      byStation[i].push(target);
    }
  });

  // Goals: finishing first, then games, then keep-ball breakouts.
  let goalsLeft = kit.goals;
  for (const kind of GOAL_PRIORITY) {
    for (const t of targets) {
      if (stations[t.index].activityKind === kind && goalsLeft > 0) {
        t.kind = 'goal';
        goalsLeft--;
      }
    }
  }

  let conesLeft = kit.cones;
  const cones: Point[][] = stations.map(() => []);
  for (const t of targets) {
    if (t.kind === 'goal' || conesLeft < 2) continue;
    t.kind = 'gate';
    conesLeft -= 2;
    cones[t.index].push(...gateCones(rects[t.index], t.direction, params.layout.gateWidthM));
  }
  for (const tier of TIERS) {
    for (let i = 0; i < stations.length; i++) {
      // Counted first: a tier the bag cannot cover is never built.
      if (tier.count(stations[i].activityKind) > conesLeft) continue;
      const points = tier.points(stations[i], rects[i], byStation[i][0]?.direction ?? 'N');
      cones[i].push(...points);
      conesLeft -= points.length;
    }
  }

  stations.forEach((station, i) => {
    const placed: GoalPlacement[] = [];
    let goals = 0;
    let targetless = false;
    for (const t of byStation[i]) {
      if (t.kind === 'none') {
        targetless = true;
        continue;
      }
      const at = edgeMidpoint(rects[i], t.direction);
      placed.push({ x: at.x, y: at.y, facing: FACING[t.direction], kind: t.kind });
      if (t.kind === 'goal') goals++;
    }
    station.goalPositions = placed;
    station.conePositions = cones[i];
    station.equipment = { ...station.equipment, cones: cones[i].length, goals };
    if (targetless) {
      warnings.push({
        code: 'no-target',
        message: `${phaseName}, ${station.title}: no goal or cones left for a gate — ${targetlessAdvice(station.activityKind)}.`,
      });
    }
  });
  if (targets.some((t) => t.kind === 'gate') && kit.goals < targets.length) {
    pushOnce(
      warnings,
      'gates-for-goals',
      `${phaseName}: gates of two cones stand in where there are not enough goals.`,
    );
  }
  if (shotsBlocked) {
    warnings.push({
      code: 'shots-toward-station',
      message: `${phaseName}: the space leaves less than ${params.layout.shotClearanceM} m behind some goals before the next station — shoot low and check the line before each shot.`,
    });
  }
}

function targetlessAdvice(kind: ActivityKind): string {
  if (kind === 'keep-ball') return 'a defender who wins the ball dribbles over any side line to score';
  if (kind === 'small-sided-game') return 'score by stopping the ball on the end line';
  return 'finish by passing into a marked end zone';
}

function pushOnce(warnings: Notice[], code: string, message: string): void {
  if (!warnings.some((w) => w.code === code && w.message === message)) warnings.push({ code, message });
}

function rectOfStation(s: Station): Rect {
  return { x: s.position.x, y: s.position.y, width: s.area.width, length: s.area.length };
}

/** Metres from the station's edge to the first other station in the corridor behind its target. */
function clearanceOf(r: Rect, d: Direction, rects: Rect[], self: number, half: number): number {
  let best = Number.POSITIVE_INFINITY;
  const cx = r.x + r.width / 2;
  const cy = r.y + r.length / 2;
  for (let j = 0; j < rects.length; j++) {
    if (j === self) continue;
    const o = rects[j];
    if (d === 'N' || d === 'S') {
      if (o.x + o.width <= cx - half || o.x >= cx + half) continue;
      const gap = d === 'N' ? o.y - (r.y + r.length) : r.y - (o.y + o.length);
      if (gap >= 0) best = Math.min(best, gap);
    } else {
      if (o.y + o.length <= cy - half || o.y >= cy + half) continue;
      const gap = d === 'E' ? o.x - (r.x + r.width) : r.x - (o.x + o.width);
      if (gap >= 0) best = Math.min(best, gap);
    }
  }
  return best;
}

/** Maps station-local (u across, v towards the target) in 0…1 to space coordinates. */
function local(r: Rect, d: Direction, u: number, v: number): Point {
  if (d === 'N') return { x: round1(r.x + u * r.width), y: round1(r.y + v * r.length) };
  if (d === 'S') return { x: round1(r.x + u * r.width), y: round1(r.y + (1 - v) * r.length) };
  if (d === 'E') return { x: round1(r.x + v * r.width), y: round1(r.y + u * r.length) };
  return { x: round1(r.x + (1 - v) * r.width), y: round1(r.y + u * r.length) };
}

function edgeMidpoint(r: Rect, d: Direction): Point {
  return local(r, d, 0.5, 1);
}

function gateCones(r: Rect, d: Direction, gateWidth: number): Point[] {
  const across = d === 'N' || d === 'S' ? r.width : r.length;
  const half = Math.min(0.5, gateWidth / 2 / across);
  return [local(r, d, 0.5 - half, 1), local(r, d, 0.5 + half, 1)];
}

/** Cone tiers in the order the bag pays for them; each count matches its points' length. */
const TIERS: readonly {
  count: (kind: ActivityKind) => number;
  points: (s: Station, r: Rect, d: Direction) => Point[];
}[] = [
  { count: (k) => (k === 'passing-finishing' ? 3 : k === 'pairs' ? 2 : 0), points: essentials },
  { count: () => 4, points: corners },
  { count: (k) => (k === 'ball-mastery' ? 4 : k === 'movement-prep' ? 2 : 0), points: extras },
];

function essentials(s: Station, r: Rect, d: Direction): Point[] {
  if (s.activityKind === 'passing-finishing') {
    return [local(r, d, 0.25, 0.15), local(r, d, 0.75, 0.15), local(r, d, 0.5, 0.45)];
  }
  if (s.activityKind === 'pairs') {
    const half = Math.min(0.5, 1 / r.width);
    return [local(r, 'N', 0.5 - half, 0.5), local(r, 'N', 0.5 + half, 0.5)];
  }
  return [];
}

function corners(_s: Station, r: Rect): Point[] {
  return [local(r, 'N', 0, 0), local(r, 'N', 1, 0), local(r, 'N', 1, 1), local(r, 'N', 0, 1)];
}

function extras(s: Station, r: Rect): Point[] {
  if (s.activityKind === 'ball-mastery') {
    return [
      local(r, 'N', 0.3, 0.45),
      local(r, 'N', 0.3, 0.55),
      local(r, 'N', 0.7, 0.45),
      local(r, 'N', 0.7, 0.55),
    ];
  }
  if (s.activityKind === 'movement-prep') return [local(r, 'N', 0.5, 0), local(r, 'N', 0.5, 1)];
  return [];
}
