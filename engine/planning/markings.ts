/**
 * Goals, gates, cones, zones, lines and start positions for a phase's stations. Targets face
 * away from neighbouring stations (and stay where last phase's goals stood when they can);
 * goals go first to stations with a goalkeeper, then to the kinds that shoot; the bag's cones
 * pay for gates, then each activity's essentials, its own gates, outlines (all four or none),
 * breakout gates and extras — never more than the bag holds, and a station that goes without
 * is told what to use instead.
 */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  GoalPlacement,
  Point,
  RuleParameters,
  Station,
  StationKind,
} from '../../shared/types';
import { round1, type Rect } from '../geometry';
import {
  FACING,
  OPPOSITE,
  edgeDirection,
  frameOf,
  toSpace,
  type Direction,
  type Frame,
} from '../kinds/frame';
import type { Drawing, LocalPoint } from '../kinds/kind-module';
import { kindModule, layoutOf } from '../kinds/registry';
import type { DerivedCode, DerivedNotices } from './derived-notices';

/** Kinds whose end targets get goals first after keepers' stations, in this order. */
const GOAL_PRIORITY: StationKind[] = [
  'goalkeeping',
  'passing-finishing',
  'shooting-game',
  'small-sided-game',
  'transition',
  'duel',
  'keep-ball',
];

interface EndTarget {
  index: number;
  direction: Direction;
  kind: 'goal' | 'gate' | 'none';
  optional: boolean;
}

const NS: readonly Direction[] = ['N', 'S'];
const EW: readonly Direction[] = ['E', 'W'];

export function markPhase(
  stations: Station[],
  activities: ActivityDefinition[],
  params: RuleParameters,
  kit: { cones: number; goals: number },
  warnings: DerivedNotices,
  phaseName: string,
  previousGoals: Point[] = [],
): void {
  const rects = stations.map(rectOfStation);
  const corridorHalf = params.layout.gateWidthM / 2 + 2;
  const frames: Frame[] = [];
  const ends: EndTarget[][] = stations.map(() => []);
  let shotsBlocked = false;

  stations.forEach((station, i) => {
    const module = kindModule(station.activityKind);
    const spec = module.targets(layoutOf(activities[i]));
    const r = rects[i];
    const lengthways = r.length >= r.width;
    const long = lengthways ? NS : EW;
    const short = lengthways ? EW : NS;
    let far: Direction = long[0];
    let clearance = Number.POSITIVE_INFINITY;
    if (spec.ends === 2) {
      const a = Math.min(
        clear(r, long[0], rects, i, corridorHalf),
        clear(r, long[1], rects, i, corridorHalf),
      );
      far = long[0];
      clearance = a;
      // Two ends along the long side, as a pitch is, unless that shoots straight at a neighbour.
      const b = Math.min(
        clear(r, short[0], rects, i, corridorHalf),
        clear(r, short[1], rects, i, corridorHalf),
      );
      if (b > a && a < params.layout.shotClearanceM) {
        far = short[0];
        clearance = b;
      }
    } else if (spec.ends === 1) {
      let best = -1;
      for (const d of [...long, ...short]) {
        const reuse = previousGoals.some((g) => near(g, edgeMid(r, d), 1)) ? params.layout.shotClearanceM : 0;
        const c = clear(r, d, rects, i, corridorHalf) + reuse;
        if (c > best) {
          best = c;
          far = d;
        }
      }
      clearance = best;
    }
    if (
      module.facesShots &&
      spec.ends > 0 &&
      clearance < params.layout.shotClearanceM &&
      Number.isFinite(clearance)
    ) {
      shotsBlocked = true;
    }
    frames.push(frameOf(r, far));
    if (spec.ends >= 1) ends[i].push({ index: i, direction: far, kind: 'none', optional: !!spec.optional });
    if (spec.ends === 2)
      ends[i].push({ index: i, direction: OPPOSITE[far], kind: 'none', optional: !!spec.optional });
  });

  // Goals: keepers' stations first (they were promised one per keeper), then by kind.
  let goalsLeft = kit.goals;
  const order = stations
    .map((s, i) => i)
    .filter((i) => ends[i].length > 0)
    .sort((a, b) => goalRank(stations[a]) - goalRank(stations[b]) || a - b);
  for (const i of order) {
    const need = ends[i].length;
    if (goalsLeft >= need) {
      for (const t of ends[i]) t.kind = 'goal';
      goalsLeft -= need;
    }
  }

  stations.forEach((station, i) => {
    const keepers = station.roles.goalkeeper ?? [];
    const goals = ends[i].filter((t) => t.kind === 'goal').length;
    // Never a keeper without a real goal: they play out instead (keepers warming up take turns in one).
    if (keepers.length && goals < keepersAtOnce(station))
      station.roles = { ...station.roles, goalkeeper: [] };
  });
  const drawings: Drawing[] = stations.map((s, i) =>
    kindModule(s.activityKind).draw(frames[i], s, layoutOf(activities[i])),
  );
  let conesLeft = kit.cones;
  const cones: Point[][] = stations.map(() => []);
  const gates: GoalPlacement[][] = stations.map(() => []);
  const notes: string[][] = stations.map(() => []);
  const gateWidth = params.layout.gateWidthM;
  const endGates = (optional: boolean) => {
    for (const list of ends) {
      for (const t of list) {
        if (t.kind !== 'none' || t.optional !== optional) continue;
        if (conesLeft < 2) continue;
        t.kind = 'gate';
        conesLeft -= 2;
        cones[t.index].push(...gateCones(frames[t.index], t.direction, gateWidth));
      }
    }
  };
  const words = markingNotes();
  const tier = (pick: (d: Drawing) => LocalPoint[], note: string | null) => {
    stations.forEach((_, i) => {
      const points = pick(drawings[i]);
      if (!points.length) return;
      if (points.length > conesLeft) {
        if (note) notes[i].push(note);
        return;
      }
      cones[i].push(...points.map((p) => toSpace(frames[i], p.u, p.v)));
      conesLeft -= points.length;
    });
  };
  endGates(false);
  tier((d) => d.essential, words.spots);
  stations.forEach((_, i) => {
    for (const g of drawings[i].gates ?? []) {
      if (conesLeft < 2) {
        notes[i].push(words.gates);
        break;
      }
      const dir = edgeDirection(frames[i], g.edge === 'near' ? 'near' : 'far');
      const at = toSpace(frames[i], g.u, g.v);
      gates[i].push({ x: at.x, y: at.y, facing: FACING[dir], kind: 'gate' });
      cones[i].push(...gateAt(frames[i], g.u, g.v, gateWidth));
      conesLeft -= 2;
    }
  });
  tier((d) => d.outline, words.corners);
  endGates(true);
  tier((d) => d.extra, null);

  stations.forEach((station, i) => {
    const placed: GoalPlacement[] = [];
    let goals = 0;
    let targetless = false;
    for (const t of ends[i]) {
      if (t.kind === 'none') {
        if (!t.optional) targetless = true;
        continue;
      }
      const at = edgeMid(rects[i], t.direction);
      placed.push({ x: at.x, y: at.y, facing: FACING[t.direction], kind: t.kind });
      if (t.kind === 'goal') goals++;
    }
    placed.push(...gates[i]);
    const d = drawings[i];
    const f = frames[i];
    station.goalPositions = placed;
    station.conePositions = cones[i];
    station.equipment = { ...station.equipment, cones: cones[i].length, goals };
    station.positions = d.positions.map((p) => ({
      id: p.id,
      role: p.role,
      ...standBeside(f, p.u, p.v, cones[i]),
    }));
    if (d.zones?.length) {
      station.zones = d.zones.map((z) => zoneToSpace(f, z.u, z.v, z.across, z.along, z.label));
    } else delete station.zones;
    if (d.lines?.length) {
      station.lines = d.lines.map((l) => ({
        from: toSpace(f, l.from.u, l.from.v),
        to: toSpace(f, l.to.u, l.to.v),
        ...(l.label ? { label: l.label } : {}),
      }));
    } else delete station.lines;
    if (targetless) notes[i].push(targetlessAdvice(station.activityKind, words));
    if (notes[i].length)
      station.notes = [...(station.notes ?? []).filter((n) => !isMarkingNote(n, words)), ...notes[i]];
    else if (station.notes) {
      station.notes = station.notes.filter((n) => !isMarkingNote(n, words));
      if (!station.notes.length) delete station.notes;
    }
  });
  const anyGate = ends.some((l) => l.some((t) => t.kind === 'gate' && !t.optional));
  if (anyGate) {
    pushOnce(
      warnings,
      'gates-for-goals',
      $localize`${phaseName}:phaseName:: gates of two cones stand in where there are not enough goals.`,
    );
  }
  if (shotsBlocked) {
    warnings.push({
      code: 'shots-toward-station',
      message: $localize`${phaseName}:phaseName:: the space leaves less than ${params.layout.shotClearanceM}:metres: m behind some goals before the next station — shoot low and check the line before each shot.`,
    });
  }
}

/**
 * Where a player starts: at their spot, or a step towards the middle of the station when a cone
 * marks that spot, so the picture shows both the cone and the player.
 */
function standBeside(f: Frame, u: number, v: number, cones: Point[]): Point {
  const at = toSpace(f, u, v);
  if (!cones.some((c) => Math.abs(c.x - at.x) < 0.4 && Math.abs(c.y - at.y) < 0.4)) return at;
  const du = f.across / 2 - u;
  const dv = f.along / 2 - v;
  const len = Math.hypot(du, dv) || 1;
  const step = Math.min(1, len);
  return toSpace(f, u + (du / len) * step, v + (dv / len) * step);
}

/** Keepers standing in goals at the same time: keepers warming up take turns in one goal. */
export function keepersAtOnce(station: Pick<Station, 'activityKind' | 'roles'>): number {
  const keepers = station.roles.goalkeeper?.length ?? 0;
  return station.activityKind === 'goalkeeping' ? Math.min(1, keepers) : keepers;
}

/** What a station is told when the bag runs out of cones or goals for it. */
function markingNotes() {
  return {
    spots: $localize`:note on a station:No cones left for its spots and lines: use bibs, bags or bottles instead.`,
    corners: $localize`:note on a station:No cones left for its corners: use bibs, bags or bottles instead.`,
    gates: $localize`:note on a station:No cones left for its gates: two bibs or bottles make each gate.`,
    ...targetlessNotes(),
  };
}

/** What a station with neither a goal nor cones for a gate at an end is told to do instead. */
function targetlessNotes() {
  return {
    endLine: $localize`:note on a station:No goal or cones for a gate: score by stopping the ball on the end line.`,
    endZone: $localize`:note on a station:No goal or cones for a gate: finish by passing into a marked end zone.`,
  };
}

type MarkingNotes = ReturnType<typeof markingNotes>;

/** The English openings too, so a plan saved before a note's wording changed is still tidied. */
const MARKING_NOTE = /^No cones left|^No goal or cones/;
const TARGETLESS_NOTE = /^No goal or cones/;

function isMarkingNote(note: string, words: MarkingNotes): boolean {
  return MARKING_NOTE.test(note) || Object.values(words).includes(note);
}

/** Whether a station's note says it has neither a goal nor cones for a gate at an end. */
export function isTargetlessNote(note: string): boolean {
  if (TARGETLESS_NOTE.test(note)) return true;
  const words = targetlessNotes();
  return note === words.endLine || note === words.endZone;
}

function goalRank(s: Station): number {
  if (s.roles.goalkeeper?.length) return -1;
  const i = GOAL_PRIORITY.indexOf(s.activityKind);
  return i < 0 ? GOAL_PRIORITY.length : i;
}

function targetlessAdvice(kind: StationKind, words: MarkingNotes): string {
  if (kind === 'small-sided-game' || kind === 'transition' || kind === 'duel') return words.endLine;
  return words.endZone;
}

function pushOnce(warnings: DerivedNotices, code: DerivedCode, message: string): void {
  if (!warnings.some((w) => w.code === code && w.message === message)) warnings.push({ code, message });
}

export function rectOfStation(s: Pick<Station, 'position' | 'area'>): Rect {
  return { x: s.position.x, y: s.position.y, width: s.area.width, length: s.area.length };
}

function near(a: Point, b: Point, within: number): boolean {
  return Math.abs(a.x - b.x) <= within && Math.abs(a.y - b.y) <= within;
}

/** Metres from the station's edge to the first other station in the corridor behind its target. */
function clear(r: Rect, d: Direction, rects: Rect[], self: number, half: number): number {
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

function edgeMid(r: Rect, d: Direction): Point {
  if (d === 'N') return { x: round1(r.x + r.width / 2), y: round1(r.y + r.length) };
  if (d === 'S') return { x: round1(r.x + r.width / 2), y: round1(r.y) };
  if (d === 'E') return { x: round1(r.x + r.width), y: round1(r.y + r.length / 2) };
  return { x: round1(r.x), y: round1(r.y + r.length / 2) };
}

/** The two cones of a gate at the middle of the edge in direction d. */
function gateCones(f: Frame, d: Direction, width: number): Point[] {
  const v = d === f.far ? f.along : 0;
  return gateAt(f, f.across / 2, v, width);
}

function gateAt(f: Frame, u: number, v: number, width: number): Point[] {
  const half = Math.min(width / 2, f.across / 2);
  return [toSpace(f, u - half, v), toSpace(f, u + half, v)];
}

function zoneToSpace(f: Frame, u: number, v: number, across: number, along: number, label: string) {
  const a = toSpace(f, u, v);
  const b = toSpace(f, u + across, v + along);
  return {
    x: Math.min(a.x, b.x),
    y: Math.min(a.y, b.y),
    width: round1(Math.abs(b.x - a.x)),
    length: round1(Math.abs(b.y - a.y)),
    label,
  };
}
