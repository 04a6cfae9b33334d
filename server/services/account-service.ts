import type { EntityManager } from 'typeorm';
import type { UserDto } from '../../shared/types/api';
import { usableLocale } from '../../shared/time/locale-format';
import type { DistanceUnit, TemperatureUnit, UnitOverride } from '../../shared/units';
import { User } from '../entities/user';
import { unauthorized } from '../http/problem';
import { userDto } from './auth-service';
import type { ClubScope } from './club-scope';
import { unitFields } from './unit-settings';

/** The fields of PATCH /api/auth/me (auth-me-update.schema.json); each is optional. */
interface AccountChange {
  name?: string;
  locale?: string;
  distanceUnit?: DistanceUnit | null;
  temperatureUnit?: TemperatureUnit | null;
}

/** What a signed-in person changes about themselves (never anyone else: the caller is the key). */
export class AccountService {
  constructor(private readonly scope: ClubScope) {}

  /**
   * A new display name and/or the browser's locale for the caller; answers the caller as everyone
   * now sees them. The locale is kept in canonical form (en-gb → en-GB); a tag Intl does not know
   * is not kept.
   */
  async update(input: AccountChange): Promise<UserDto> {
    const { auth } = this.scope;
    const change: Partial<Pick<User, 'name' | 'locale' | 'distanceUnit' | 'temperatureUnit'>> = {};
    if (input.name !== undefined) change.name = input.name.trim();
    if (input.locale !== undefined) change.locale = usableLocale(input.locale, '') || null;
    // Units: null goes back to following the club.
    if (input.distanceUnit !== undefined) change.distanceUnit = input.distanceUnit;
    if (input.temperatureUnit !== undefined) change.temperatureUnit = input.temperatureUnit;
    const result = await this.scope.manager.getRepository(User).update({ id: auth.userId }, change);
    if (!result.affected) throw unauthorized();
    const ownUnits: UnitOverride = {
      distance: change.distanceUnit !== undefined ? change.distanceUnit : auth.ownUnits.distance,
      temperature: change.temperatureUnit !== undefined ? change.temperatureUnit : auth.ownUnits.temperature,
    };
    return userDto({
      ...auth,
      ...(change.name !== undefined ? { name: change.name } : {}),
      ...unitFields(auth.clubUnits, ownUnits),
    });
  }
}

/** The locale dates and times are written in for a person: their stored one, else the club's (CLUB_LOCALE). */
export async function localeOf(manager: EntityManager, userId: string, fallback: string): Promise<string> {
  const user = await manager
    .getRepository(User)
    .findOne({ where: { id: userId }, select: { id: true, locale: true } });
  return usableLocale(user?.locale, fallback);
}
