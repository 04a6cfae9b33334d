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
