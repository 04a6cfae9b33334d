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
  station: Station;
  direction: Direction;
  kind: 'goal' | 'gate' | 'none';
}

export function markPhase(
  stations: Station[],
  space: Space,
  params: RuleParameters,
  kit: { cones: number; goals: number },
  warnings: Notice[],
  phaseName: string,
): void {
  const rects = stations.map((s) => ({
    x: s.position.x,
    y: s.position.y,
    width: s.area.width,
    length: s.area.length,
  }));
  const targets: Target[] = [];
  const corridorHalf = params.layout.gateWidthM / 2 + 2;
  let shotsBlocked = false;

  stations.forEach((station, i) => {
    const rule = params.kinds[station.activityKind].goals;
    if (rule === 'none') return;
    const others = rects.filter((_, j) => j !== i);
    const long =
      rects[i].length >= rects[i].width ? (['N', 'S'] as Direction[]) : (['E', 'W'] as Direction[]);
    const short = long[0] === 'N' ? (['E', 'W'] as Direction[]) : (['N', 'S'] as Direction[]);
    let chosen: Direction[];
    let clearance: number;
    if (rule === 'two') {
      const a = Math.min(...long.map((d) => clearanceOf(rects[i], d, others, corridorHalf)));
      const b = Math.min(...short.map((d) => clearanceOf(rects[i], d, others, corridorHalf)));
      chosen = b > a ? short : long;
      clearance = Math.max(a, b);
    } else {
      let best: Direction = long[0];
      let bestClear = -1;
      for (const d of [...long, ...short]) {
        const c = clearanceOf(rects[i], d, others, corridorHalf);
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
    for (const d of chosen) targets.push({ station, direction: d, kind: 'none' });
  });

  // Goals: finishing first, then games, then keep-ball breakouts.
  let goalsLeft = kit.goals;
  for (const kind of GOAL_PRIORITY) {
    for (const t of targets) {
      if (t.station.activityKind === kind && goalsLeft > 0) {
        t.kind = 'goal';
        goalsLeft--;
      }
    }
  }

  let conesLeft = kit.cones;
  const cones = new Map<Station, Point[]>(stations.map((s) => [s, []]));
  for (const t of targets) {
    if (t.kind === 'goal' || conesLeft < 2) continue;
    t.kind = 'gate';
    conesLeft -= 2;
    cones.get(t.station)!.push(...gateCones(rectOfStation(t.station), t.direction, params.layout.gateWidthM));
  }
  const directionOf = (s: Station): Direction => targets.find((t) => t.station === s)?.direction ?? 'N';
  for (const tier of [essentials, corners, extras]) {
    for (const station of stations) {
      const points = tier(station, directionOf(station));
      if (points.length <= conesLeft) {
        cones.get(station)!.push(...points);
        conesLeft -= points.length;
      }
    }
  }

  for (const station of stations) {
    const mine = targets.filter((t) => t.station === station);
    const placed: GoalPlacement[] = mine
      .filter((t) => t.kind !== 'none')
      .map((t) => ({
        ...edgeMidpoint(rectOfStation(station), t.direction),
        facing: FACING[t.direction],
        kind: t.kind as 'goal' | 'gate',
      }));
    station.goalPositions = placed;
    station.conePositions = cones.get(station)!;
    station.equipment = {
      ...station.equipment,
      cones: station.conePositions.length,
      goals: placed.filter((g) => g.kind === 'goal').length,
    };
    if (mine.some((t) => t.kind === 'none')) {
      warnings.push({
        code: 'no-target',
        message: `${phaseName}, ${station.title}: no goal or cones left for a gate — ${targetlessAdvice(station.activityKind)}.`,
      });
    }
  }
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
function clearanceOf(r: Rect, d: Direction, others: Rect[], half: number): number {
  let best = Number.POSITIVE_INFINITY;
  const cx = r.x + r.width / 2;
  const cy = r.y + r.length / 2;
  for (const o of others) {
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
  const p =
    d === 'N'
      ? { x: r.x + u * r.width, y: r.y + v * r.length }
      : d === 'S'
        ? { x: r.x + u * r.width, y: r.y + (1 - v) * r.length }
        : d === 'E'
          ? { x: r.x + v * r.width, y: r.y + u * r.length }
          : { x: r.x + (1 - v) * r.width, y: r.y + u * r.length };
  return { x: round1(p.x), y: round1(p.y) };
}

function edgeMidpoint(r: Rect, d: Direction): Point {
  return local(r, d, 0.5, 1);
}

function gateCones(r: Rect, d: Direction, gateWidth: number): Point[] {
  const across = d === 'N' || d === 'S' ? r.width : r.length;
  const half = Math.min(0.5, gateWidth / 2 / across);
  return [local(r, d, 0.5 - half, 1), local(r, d, 0.5 + half, 1)];
}

function essentials(s: Station, d: Direction): Point[] {
  const r = rectOfStation(s);
  if (s.activityKind === 'passing-finishing') {
    return [local(r, d, 0.25, 0.15), local(r, d, 0.75, 0.15), local(r, d, 0.5, 0.45)];
  }
  if (s.activityKind === 'pairs') {
    const half = Math.min(0.5, 1 / r.width);
    return [local(r, 'N', 0.5 - half, 0.5), local(r, 'N', 0.5 + half, 0.5)];
  }
  return [];
}

function corners(s: Station): Point[] {
  const r = rectOfStation(s);
  return [local(r, 'N', 0, 0), local(r, 'N', 1, 0), local(r, 'N', 1, 1), local(r, 'N', 0, 1)];
}

function extras(s: Station): Point[] {
  const r = rectOfStation(s);
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
