import {
  effectiveUnits,
  type DistanceUnit,
  type TemperatureUnit,
  type UnitOverride,
  type Units,
} from '../../shared/units';

/** The unit columns of a club row and of a person's row. */
export interface ClubUnitColumns {
  distanceUnit: DistanceUnit;
  temperatureUnit: TemperatureUnit;
}
interface OwnUnitColumns {
  distanceUnit: DistanceUnit | null;
  temperatureUnit: TemperatureUnit | null;
}

/** The three unit fields of a signed-in context: what the person reads, the club's, their own. */
export function unitFields(
  clubUnits: Units,
  ownUnits: UnitOverride,
): { units: Units; clubUnits: Units; ownUnits: UnitOverride } {
  return { units: effectiveUnits(clubUnits, ownUnits), clubUnits, ownUnits };
}

/** The same, from a club's row and a person's row (or no choice of their own). */
export function unitsOf(club: ClubUnitColumns, own: OwnUnitColumns | null) {
  return unitFields(
    { distance: club.distanceUnit, temperature: club.temperatureUnit },
    { distance: own?.distanceUnit ?? null, temperature: own?.temperatureUnit ?? null },
  );
}
