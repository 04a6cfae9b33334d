import type { DataSource } from 'typeorm';
import {
  effectiveUnits,
  type DistanceUnit,
  type TemperatureUnit,
  type UnitOverride,
  type Units,
} from '../../shared/units';
import { Club } from '../entities/club';
import { notFound } from '../http/problem';

/** The unit columns of a club row and of a person's row. */
interface ClubUnitColumns {
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

/** The club's unit setting: everyone reads it; the head of coaching changes it (the route says who). */
export class ClubUnitsService {
  constructor(private readonly dataSource: DataSource) {}

  async get(clubId: string): Promise<Units> {
    const club = await this.dataSource.getRepository(Club).findOneBy({ id: clubId });
    if (!club) throw notFound('Club');
    return { distance: club.distanceUnit, temperature: club.temperatureUnit };
  }

  /** Sets one or both; what is not given stays. Answers the whole setting. */
  async set(clubId: string, input: Partial<Units>): Promise<Units> {
    const change: Partial<ClubUnitColumns> = {};
    if (input.distance) change.distanceUnit = input.distance;
    if (input.temperature) change.temperatureUnit = input.temperature;
    if (Object.keys(change).length) await this.dataSource.getRepository(Club).update({ id: clubId }, change);
    return this.get(clubId);
  }
}
