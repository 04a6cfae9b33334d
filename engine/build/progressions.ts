/** Concrete easier/harder steps for a station: the next area within the rule's bounds, and a condition. */
import type { ActivityKind, AgeBand, Area, RuleParameters, Space, Station } from '../../shared/types';
import { areaForWidth, areaTable, describeArea, steppedWidth } from './areas';

const CONDITIONS: Record<ActivityKind, { easier: string; harder: string }> = {
  'ball-mastery': {
    easier: 'Walk the ball through each challenge first',
    harder: 'Race the clock: 30 seconds per challenge',
  },
  'passing-finishing': { easier: 'Shoot from a closer cone', harder: 'Shoot first time from the pass' },
  'keep-ball': {
    easier: 'Defender must win the ball twice before swapping',
    harder: 'Attackers limited to two touches',
  },
  pairs: { easier: 'Stop the ball before each pass', harder: 'Weaker foot only' },
  'small-sided-game': { easier: 'A goal counts double after three passes', harder: 'Three touches maximum' },
  'movement-prep': { easier: 'Half pace, longer rest', harder: 'Add a sprint to the last cone' },
};

/** The table's width side of an area (tables are given across × along with width ≤ length). */
export function widthSide(area: Area): number {
  return Math.min(area.width, area.length);
}

/** The area one step harder or easier, keeping orientation; null when at the rule's bound. */
export function steppedArea(
  params: RuleParameters,
  kind: ActivityKind,
  band: AgeBand,
  area: Area,
  direction: 'harder' | 'easier',
  space: Space,
): Area | null {
  const table = areaTable(params, kind, band);
  const sign = (params.kinds[kind].harderWhenArea === 'smaller') === (direction === 'harder') ? -1 : 1;
  const current = widthSide(area);
  const next = steppedWidth(table, current, sign);
  if (next === current) return null;
  const sized = areaForWidth(table, next, space);
  const rotated = area.width > area.length;
  const out = rotated ? { width: sized.length, length: sized.width } : sized;
  if (out.width === area.width && out.length === area.length) return null;
  return out;
}

export function progressionsFor(
  station: Pick<Station, 'activityKind' | 'area'>,
  params: RuleParameters,
  band: AgeBand,
  space: Space,
): Station['progressions'] {
  const kind = station.activityKind;
  const easierArea = steppedArea(params, kind, band, station.area, 'easier', space);
  const harderArea = steppedArea(params, kind, band, station.area, 'harder', space);
  const from = describeArea(station.area);
  const { easier, harder } = CONDITIONS[kind];
  // Built whole: unshift onto a one-item array reallocates its storage.
  return {
    easier: easierArea ? [`Area ${from} → ${describeArea(easierArea)}`, easier] : [easier],
    harder: harderArea ? [`Area ${from} → ${describeArea(harderArea)}`, harder] : [harder],
  };
}
