import type { Units } from '../../shared/units';
import { Club } from '../entities/club';
import { notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import type { ClubUnitColumns } from './unit-settings';

/** The caller's club's unit setting: everyone reads it; the head of coaching changes it (the route says who). */
export class ClubUnitsService {
  constructor(private readonly scope: ClubScope) {}

  async get(): Promise<Units> {
    const club = await this.scope.manager.getRepository(Club).findOneBy({ id: this.scope.clubId });
    if (!club) throw notFound('Club');
    return { distance: club.distanceUnit, temperature: club.temperatureUnit };
  }

  /** Sets one or both; what is not given stays. Answers the whole setting. */
  async set(input: Partial<Units>): Promise<Units> {
    const change: Partial<ClubUnitColumns> = {};
    if (input.distance) change.distanceUnit = input.distance;
    if (input.temperature) change.temperatureUnit = input.temperature;
    if (Object.keys(change).length)
      await this.scope.manager.getRepository(Club).update({ id: this.scope.clubId }, change);
    return this.get();
  }
}
