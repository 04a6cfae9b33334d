/** Rectangles in the space's coordinates: x across the width, y along the length, metres. */
import type { Area, Point, Space } from '../shared/types';

export interface Rect {
  x: number;
  y: number;
  width: number;
  length: number;
}

export function rectOf(position: Point, area: Area): Rect {
  return { x: position.x, y: position.y, width: area.width, length: area.length };
}

const EPS = 1e-6;

export function insideSpace(r: Rect, space: Space): boolean {
  return (
    r.x >= -EPS && r.y >= -EPS && r.x + r.width <= space.width + EPS && r.y + r.length <= space.length + EPS
  );
}

/** True when the two rectangles share any area (touching edges do not count). */
export function overlaps(a: Rect, b: Rect): boolean {
  return (
    a.x < b.x + b.width - EPS &&
    b.x < a.x + a.width - EPS &&
    a.y < b.y + b.length - EPS &&
    b.y < a.y + a.length - EPS
  );
}

/** Smallest gap between two non-overlapping rectangles (0 when they touch or overlap). */
export function gapBetween(a: Rect, b: Rect): number {
  const dx = Math.max(0, b.x - (a.x + a.width), a.x - (b.x + b.width));
  const dy = Math.max(0, b.y - (a.y + a.length), a.y - (b.y + b.length));
  return Math.hypot(dx, dy);
}

/**
 * Whether two stations have room between them: apart by the layout's buffer, up to half a metre
 * (a tight space may pack closer than the buffer; never touching). The plan check and a station's
 * area step both ask this, so an area the buttons allow is never one the check refuses.
 */
export function roomBetween(a: Rect, b: Rect, bufferM: number): boolean {
  return !overlaps(a, b) && gapBetween(a, b) >= Math.min(bufferM, 0.5) - 1e-6;
}

export function round1(value: number): number {
  return Math.round(value * 10) / 10;
}
