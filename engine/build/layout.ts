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
  const order = areas
    .map((a, i) => i)
    .sort(
      (i, j) =>
        Math.max(areas[j].length, areas[j].width) - Math.max(areas[i].length, areas[i].width) || i - j,
    );
  const rows: { y: number; length: number; items: { index: number; x: number; area: Area }[] }[] = [];
  let row = { y: 0, length: 0, items: [] as { index: number; x: number; area: Area }[] };
  let x = 0;
  for (const index of order) {
    const options = orientations(areas[index], rotatable[index]);
    let placed = false;
    for (const area of options) {
      const startX = row.items.length ? x + buffer : 0;
      if (startX + area.width <= space.width && row.y + area.length <= space.length) {
        row.items.push({ index, x: startX, area });
        row.length = Math.max(row.length, area.length);
        x = startX + area.width;
        placed = true;
        break;
      }
    }
    if (placed) continue;
    if (!row.items.length) return null;
    rows.push(row);
    row = { y: row.y + row.length + buffer, length: 0, items: [] };
    x = 0;
    const area = options.find((a) => a.width <= space.width && row.y + a.length <= space.length);
    if (!area) return null;
    row.items.push({ index, x: 0, area });
    row.length = area.length;
    x = area.width;
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

function orientations(area: Area, rotatable: boolean): Area[] {
  if (!rotatable || area.width === area.length) return [area];
  return [area, { width: area.length, length: area.width }];
}

/** Rounds down to 0.1 m so a spread station never pokes past the space's edge. */
function floor1(value: number): number {
  return Math.floor(value * 10 + 1e-6) / 10;
}
