/**
 * A station's frame: which edge is its far end, and how station-local metres (u across, v
 * along towards the far end) map to the space's coordinates. Kinds draw in local metres; the
 * frame puts the drawing on the grass.
 */
import type { Point } from '../../shared/types';
import type { Rect } from '../geometry';
import type { FrameSize } from './kind-module';

/** The far end: N is the station's +y edge, S its origin edge, E its +x edge, W its origin edge. */
export type Direction = 'N' | 'S' | 'E' | 'W';

/** Which way a goal mouth at that edge faces (into the station), in degrees: 0 = along +y. */
export const FACING: Record<Direction, number> = { N: 180, S: 0, E: 270, W: 90 };

export const OPPOSITE: Record<Direction, Direction> = { N: 'S', S: 'N', E: 'W', W: 'E' };

export interface Frame extends FrameSize {
  rect: Rect;
  far: Direction;
}

export function frameOf(rect: Rect, far: Direction): Frame {
  const lengthways = far === 'N' || far === 'S';
  return {
    rect,
    far,
    across: lengthways ? rect.width : rect.length,
    along: lengthways ? rect.length : rect.width,
  };
}

/** Local metres to the space, clamped inside the station and rounded to 0.1 m. */
export function toSpace(f: Frame, u: number, v: number): Point {
  const uu = Math.min(f.across, Math.max(0, u));
  const vv = Math.min(f.along, Math.max(0, v));
  const r = f.rect;
  switch (f.far) {
    case 'N':
      return { x: round1(r.x + uu), y: round1(r.y + vv) };
    case 'S':
      return { x: round1(r.x + uu), y: round1(r.y + r.length - vv) };
    case 'E':
      return { x: round1(r.x + vv), y: round1(r.y + uu) };
    case 'W':
      return { x: round1(r.x + r.width - vv), y: round1(r.y + uu) };
  }
}

/** The edge a local edge name stands for. */
export function edgeDirection(f: Frame, edge: 'far' | 'near'): Direction {
  return edge === 'far' ? f.far : OPPOSITE[f.far];
}

function round1(value: number): number {
  return Math.round(value * 10) / 10;
}
