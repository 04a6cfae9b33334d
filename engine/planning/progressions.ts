/** Easier and harder steps for a station: the next area within the club's bounds, then the activity's own steps. */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  AgeBand,
  Area,
  RuleParameters,
  Space,
  Station,
  StationKind,
} from '../../shared/types';
import { areaForWidth, boundedTable, describeArea, steppedWidth } from './areas';

/** The table's width side of an area (tables are given across × along with width ≤ length). */
export function widthSide(area: Area): number {
  return Math.min(area.width, area.length);
}

/** The area one step harder or easier, keeping orientation; null when at the rule's bound. */
export function steppedArea(
  params: RuleParameters,
  kind: StationKind,
  band: AgeBand,
  area: Area,
  direction: 'harder' | 'easier',
  space: Space,
  total: number,
): Area | null {
  const table = boundedTable(params, kind, band, total);
  const sign = (params.kinds[kind].harderWhenArea === 'smaller') === (direction === 'harder') ? -1 : 1;
  const current = widthSide(area);
  const next = steppedWidth(table, current, sign);
  if (next === current) return null;
  const sized = areaForWidth(table, next, space);
  if (Math.min(sized.width, sized.length) < table.minWidth) return null;
  const rotated = area.width > area.length;
  const out = rotated ? { width: sized.length, length: sized.width } : sized;
  if (out.width === area.width && out.length === area.length) return null;
  return out;
}

export function progressionsFor(
  station: Pick<Station, 'activityKind' | 'area' | 'playerIds' | 'coachJoins'>,
  activity: Pick<ActivityDefinition, 'easier' | 'harder'>,
  params: RuleParameters,
  band: AgeBand,
  space: Space,
): Station['progressions'] {
  const kind = station.activityKind;
  const total = station.playerIds.length + station.coachJoins;
  const easierArea = steppedArea(params, kind, band, station.area, 'easier', space, total);
  const harderArea = steppedArea(params, kind, band, station.area, 'harder', space, total);
  const from = describeArea(station.area);
  return {
    easier: easierArea
      ? [areaStep(from, describeArea(easierArea)), ...activity.easier]
      : [...activity.easier],
    harder: harderArea
      ? [areaStep(from, describeArea(harderArea)), ...activity.harder]
      : [...activity.harder],
  };
}

/** The area step a coach can take: "Area 14 m → 16 m". */
function areaStep(from: string, to: string): string {
  return $localize`:an easier or harder step for a station, its area from one size to another:Area ${from}:fromSize: → ${to}:toSize:`;
}
