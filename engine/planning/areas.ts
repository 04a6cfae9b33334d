/** Area sides from the rule set's tables: scaled with group size and level, stepped, clamped. */
import type { AgeBand, Area, AreaSize, Level, RuleParameters, Space, StationKind } from '../../shared/types';

export function areaTable(params: RuleParameters, kind: StationKind, band: AgeBand): AreaSize {
  return params.areas[kind][band];
}

/** Width from the table for a group of `total` (players and any coach), before steps. */
export function baseWidth(
  params: RuleParameters,
  kind: StationKind,
  band: AgeBand,
  level: Level,
  total: number,
) {
  const t = areaTable(params, kind, band);
  return t.width * Math.sqrt(Math.max(1, total) / t.forPlayers) * params.areaLevelScale[level];
}

/**
 * The table with the kind's own floor: keep-ball needs its square metres per player and its
 * shortest side (the club's `keepBallLimits`), whatever the table's minimum says.
 */
export function boundedTable(
  params: RuleParameters,
  kind: StationKind,
  band: AgeBand,
  total: number,
): AreaSize {
  const t = areaTable(params, kind, band);
  if (kind !== 'keep-ball') return t;
  const limits = params.keepBallLimits;
  const floor = Math.ceil(Math.max(limits.minSideM, Math.sqrt(limits.minM2PerPlayer * Math.max(1, total))));
  return floor > t.minWidth ? { ...t, minWidth: floor, maxWidth: Math.max(t.maxWidth, floor) } : t;
}

/** Whole-metre area for a width, keeping the table's proportion and the rule's bounds and the space. */
export function areaForWidth(table: AreaSize, width: number, space: Space): Area {
  const w = Math.min(table.maxWidth, Math.max(table.minWidth, width));
  let area = { width: Math.round(w), length: Math.round((w * table.length) / table.width) };
  // Too big for the space: shrink proportionally; the layout refuses it when below the rule minimum.
  const fit = Math.min(1, space.width / area.width, space.length / area.length);
  const fitRotated = Math.min(1, space.width / area.length, space.length / area.width);
  const scale = Math.max(fit, fitRotated);
  if (scale < 1) {
    area = {
      width: Math.max(1, Math.floor(area.width * scale)),
      length: Math.max(1, Math.floor(area.length * scale)),
    };
  }
  return area;
}

/** Whether an area keeps the table's minimum on its shorter side. */
export function meetsMinimum(table: AreaSize, area: Area): boolean {
  return Math.min(area.width, area.length) >= table.minWidth - 1e-9;
}

/** Steps a width by whole table steps within the rule's bounds. */
export function steppedWidth(table: AreaSize, width: number, steps: number): number {
  return Math.min(table.maxWidth, Math.max(table.minWidth, width + steps * table.step));
}

export function describeArea(a: Area): string {
  return a.width === a.length ? `${a.width} m` : `${a.width} × ${a.length} m`;
}

/** Where recent feedback says an activity's area should start: a width, and the group it was for. */
export interface StartWidth {
  width: number;
  /** Players (and any coach) the width was for; another group size scales it, as the table does. */
  forGroup?: number;
}

/**
 * Start widths from the team's recent feedback: by activity (`activity:<id>`), and by kind
 * (`kind:<kind>`) only for a verdict that named no activity or a club rule's step without one.
 */
export type StartWidths = Record<string, StartWidth>;

/** Where an activity's area starts: its own verdict, else a kind-wide one, else none. */
export function startWidthFor(
  widths: StartWidths,
  activity: { id: string; kind: StationKind },
): StartWidth | undefined {
  return widths[`activity:${activity.id}`] ?? widths[`kind:${activity.kind}`];
}

/**
 * The start width for a group of `total`: area in proportion to players, the same square-root
 * law as `baseWidth`, so a square that was right for four stays as roomy for six.
 */
export function widthForGroup(start: StartWidth, total: number): number {
  return start.forGroup ? start.width * Math.sqrt(Math.max(1, total) / start.forGroup) : start.width;
}
