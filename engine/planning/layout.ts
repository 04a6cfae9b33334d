/**
 * Places station rectangles inside the space in rows with a buffer between them, then spreads
 * the spare room evenly so stations sit apart. Returns null when they cannot fit.
 */
import type { Area, Point, Space } from '../../shared/types';

export interface Placement {
  position: Point;
  area: Area;
}

export function packStations(
  areas: Area[],
  space: Space,
  requestedBuffer: number,
  rotatable: boolean[],
): Placement[] | null {
  // A little clearance always, so rounding positions to 0.1 m can never make stations touch.
  const buffer = Math.max(requestedBuffer, 0.5);
  const order = largestFirst(areas);
  const rows: { y: number; length: number; items: { index: number; x: number; area: Area }[] }[] = [];
  let row = { y: 0, length: 0, items: [] as { index: number; x: number; area: Area }[] };
  let x = 0;
  for (const index of order) {
    const given = areas[index];
    // The turned option is tried second and only built when it is the one placed.
    const turnable = rotatable[index] && given.width !== given.length;
    const startX = row.items.length ? x + buffer : 0;
    const area = fits(startX, row.y, given.width, given.length, space)
      ? given
      : turnable && fits(startX, row.y, given.length, given.width, space)
        ? { width: given.length, length: given.width }
        : null;
    if (area) {
      row.items.push({ index, x: startX, area });
      row.length = Math.max(row.length, area.length);
      x = startX + area.width;
      continue;
    }
    if (!row.items.length) return null;
    rows.push(row);
    row = { y: row.y + row.length + buffer, length: 0, items: [] };
    x = 0;
    const fresh = fits(0, row.y, given.width, given.length, space)
      ? given
      : turnable && fits(0, row.y, given.length, given.width, space)
        ? { width: given.length, length: given.width }
        : null;
    if (!fresh) return null;
    row.items.push({ index, x: 0, area: fresh });
    row.length = fresh.length;
    x = fresh.width;
  }
  if (row.items.length) rows.push(row);

  // Spread spare length between rows and spare width between stations of each row.
  const usedLength = rows.reduce((s, r) => s + r.length, 0) + buffer * (rows.length - 1);
  const rowGap = (space.length - usedLength) / (rows.length + 1);
  const out: Placement[] = new Array(areas.length);
  rows.forEach((r, ri) => {
    const usedWidth = r.items.reduce((s, it) => s + it.area.width, 0) + buffer * (r.items.length - 1);
    const gap = (space.width - usedWidth) / (r.items.length + 1);
    const y = r.y + rowGap * (ri + 1);
    r.items.forEach((it, k) => {
      const x0 = it.x + gap * (k + 1);
      out[it.index] = {
        position: { x: floor1(x0), y: floor1(y + (r.length - it.area.length) / 2) },
        area: it.area,
      };
    });
  });
  return out;
}

function fits(x: number, y: number, width: number, length: number, space: Space): boolean {
  return x + width <= space.width && y + length <= space.length;
}

/**
 * Indices by longest side, largest first, ties in index order: an insertion sort, since a
 * handful of stations is packed many times per plan and the built-in sort allocates each call.
 */
function largestFirst(areas: Area[]): number[] {
  const order: number[] = new Array(areas.length);
  for (let i = 0; i < areas.length; i++) {
    const side = Math.max(areas[i].length, areas[i].width);
    let k = i;
    for (; k > 0; k--) {
      const prev = areas[order[k - 1]];
      if (Math.max(prev.length, prev.width) >= side) break;
      order[k] = order[k - 1];
    }
    order[k] = i;
  }
  return order;
}

/** Rounds down to 0.1 m so a spread station never pokes past the space's edge. */
function floor1(value: number): number {
  return Math.floor(value * 10 + 1e-6) / 10;
}

/** A station to place, and the bounds its shorter side may take if it reuses an old grid. */
export interface Wanted {
  area: Area;
  minWidth: number;
  maxWidth: number;
  /** Its kind: a grid of the same kind is reused first (a keepers' goal stays a keepers' goal). */
  kind: string;
}

/**
 * Keeps last phase's grids for the stations they suit (same kind first, then any grid whose
 * shorter side is within the new station's bounds and whose size and shape are close to what the
 * new group wants) and packs the rest around them. Null when nothing is reused or the rest do
 * not fit: the caller then lays the phase out afresh.
 */
export function reuseLayout(
  previous: { position: Point; area: Area; activityKind: string }[],
  wanted: Wanted[],
  space: Space,
  buffer: number,
  rotatable: boolean[],
): Placement[] | null {
  if (!previous.length) return null;
  const taken = new Set<number>();
  const out: (Placement | undefined)[] = new Array(wanted.length);
  const order = wanted
    .map((_, i) => i)
    .sort((a, b) => areaOf(wanted[b].area) - areaOf(wanted[a].area) || a - b);
  for (const sameKind of [true, false]) {
    for (const i of order) {
      if (out[i]) continue;
      const w = wanted[i];
      let best = -1;
      let bestScore = Number.POSITIVE_INFINITY;
      previous.forEach((p, j) => {
        if (taken.has(j) || (sameKind && p.activityKind !== w.kind)) return;
        if (!suits(p.area, w)) return;
        const score = Math.abs(Math.log(areaOf(p.area) / areaOf(w.area)));
        if (score < bestScore) {
          best = j;
          bestScore = score;
        }
      });
      if (best >= 0) {
        taken.add(best);
        out[i] = { position: { ...previous[best].position }, area: { ...previous[best].area } };
      }
    }
  }
  if (!taken.size) return null;
  const rest = wanted.map((_, i) => i).filter((i) => !out[i]);
  if (rest.length) {
    const fixed = out
      .filter((p): p is Placement => !!p)
      .map((p) => ({ ...p.position, width: p.area.width, length: p.area.length }));
    const placed = packAround(
      rest.map((i) => wanted[i].area),
      fixed,
      space,
      Math.max(buffer, 0.5),
      rest.map((i) => rotatable[i]),
    );
    if (!placed) return null;
    rest.forEach((i, k) => (out[i] = placed[k]));
  }
  return out as Placement[];
}

function suits(old: Area, w: Wanted): boolean {
  const side = Math.min(old.width, old.length);
  if (side < w.minWidth - 1e-9 || side > w.maxWidth + 1e-9) return false;
  // Close enough that passes, runs and shots keep the length the club's tables give them.
  const size = areaOf(old) / areaOf(w.area);
  if (size < 0.75 || size > 1.35) return false;
  const shape = aspect(old) / aspect(w.area);
  return shape >= 0.75 && shape <= 1.35;
}

interface FreeRect {
  x: number;
  y: number;
  width: number;
  length: number;
}

/**
 * Packs areas into the space around fixed rectangles, keeping `buffer` clear of everything:
 * free rectangles (the maximal-rectangles method), each area into the free rectangle that
 * leaves the shortest side over. Null when one does not fit.
 */
export function packAround(
  areas: Area[],
  fixed: FreeRect[],
  space: Space,
  buffer: number,
  rotatable: boolean[],
): Placement[] | null {
  let free: FreeRect[] = [{ x: 0, y: 0, width: space.width, length: space.length }];
  for (const f of fixed) free = subtract(free, inflate(f, buffer));
  const out: Placement[] = new Array(areas.length);
  for (const index of largestFirst(areas)) {
    const given = areas[index];
    const options =
      rotatable[index] && given.width !== given.length
        ? [given, { width: given.length, length: given.width }]
        : [given];
    let best: { rect: FreeRect; area: Area; score: number } | null = null;
    for (const r of free) {
      for (const a of options) {
        if (a.width > r.width + 1e-9 || a.length > r.length + 1e-9) continue;
        const score = Math.min(r.width - a.width, r.length - a.length);
        if (!best || score < best.score) best = { rect: r, area: a, score };
      }
    }
    if (!best) return null;
    const placed = {
      x: floor1(best.rect.x),
      y: floor1(best.rect.y),
      width: best.area.width,
      length: best.area.length,
    };
    out[index] = { position: { x: placed.x, y: placed.y }, area: best.area };
    free = subtract(free, inflate(placed, buffer));
  }
  return out;
}

function inflate(r: FreeRect, by: number): FreeRect {
  return { x: r.x - by, y: r.y - by, width: r.width + 2 * by, length: r.length + 2 * by };
}

/** The free rectangles with `cut` taken out: each one it touches splits into up to four. */
function subtract(free: FreeRect[], cut: FreeRect): FreeRect[] {
  const out: FreeRect[] = [];
  for (const r of free) {
    const apart =
      cut.x >= r.x + r.width ||
      cut.x + cut.width <= r.x ||
      cut.y >= r.y + r.length ||
      cut.y + cut.length <= r.y;
    if (apart) {
      out.push(r);
      continue;
    }
    if (cut.x > r.x) out.push({ x: r.x, y: r.y, width: cut.x - r.x, length: r.length });
    if (cut.x + cut.width < r.x + r.width)
      out.push({ x: cut.x + cut.width, y: r.y, width: r.x + r.width - cut.x - cut.width, length: r.length });
    if (cut.y > r.y) out.push({ x: r.x, y: r.y, width: r.width, length: cut.y - r.y });
    if (cut.y + cut.length < r.y + r.length)
      out.push({
        x: r.x,
        y: cut.y + cut.length,
        width: r.width,
        length: r.y + r.length - cut.y - cut.length,
      });
  }
  // Drop rectangles inside another: they add nothing.
  return out.filter(
    (a, i) =>
      a.width > 1e-9 &&
      a.length > 1e-9 &&
      !out.some(
        (b, j) =>
          j !== i &&
          b.x <= a.x + 1e-9 &&
          b.y <= a.y + 1e-9 &&
          b.x + b.width >= a.x + a.width - 1e-9 &&
          b.y + b.length >= a.y + a.length - 1e-9 &&
          (j < i || b.width * b.length > a.width * a.length + 1e-9),
      ),
  );
}

function areaOf(a: Area): number {
  return a.width * a.length;
}

/** Long side over short side. */
function aspect(a: Area): number {
  return Math.max(a.width, a.length) / Math.max(1e-9, Math.min(a.width, a.length));
}
