import '../../shared/i18n/localize';
import bcrypt from 'bcryptjs';
import type { EntityManager } from 'typeorm';
import type { UserDto } from '../../shared/types/api';
import { usableLocale } from '../../shared/time/locale-format';
import type { DistanceUnit, TemperatureUnit, UnitOverride } from '../../shared/units';
import { User } from '../entities/user';
import { HttpError, unauthorized } from '../http/problem';
import { hashPassword, userDto } from './auth-service';
import type { ClubScope } from './club-scope';
import { unitFields } from './unit-settings';

/** The fields of PATCH /api/auth/me (auth-me-update.schema.json); each is optional. */
interface AccountChange {
  name?: string;
  locale?: string;
  distanceUnit?: DistanceUnit | null;
  temperatureUnit?: TemperatureUnit | null;
}

/**
 * What a signed-in person does to their own account (never anyone else's: the caller is the key):
 * their name, locale and units, their password, and ending their sessions.
 */
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

  /**
   * Ends the caller's own session: its token id is kept until the token would have expired, and
   * expired entries are cleared in passing. A token from before token ids can only be ended by
   * ending every session of the person.
   */
  async signOut(): Promise<void> {
    const { auth } = this.scope;
    if (!auth.token) return this.signOutEverywhere();
    await this.scope.manager.query(
      `INSERT INTO revoked_token (jti, "expiresAt") VALUES ($1, to_timestamp($2)) ON CONFLICT (jti) DO NOTHING`,
      [auth.token.id, auth.token.expiresAt],
    );
    await this.scope.manager.query(`DELETE FROM revoked_token WHERE "expiresAt" < now()`);
  }

  /** Ends every session of the caller, on every device and instance, at once. */
  async signOutEverywhere(): Promise<void> {
    await this.scope.manager.query(`UPDATE app_user SET "tokenVersion" = "tokenVersion" + 1 WHERE id = $1`, [
      this.scope.auth.userId,
    ]);
  }

  /**
   * A new password, given the current one; every session of the person ends with it (the device
   * that changed it signs in again with the new password).
   */
  async changePassword(input: { currentPassword: string; newPassword: string }): Promise<void> {
    const { auth } = this.scope;
    const user = await this.scope.manager.getRepository(User).findOneBy({ id: auth.userId });
    if (!user) throw unauthorized();
    if (!(await bcrypt.compare(input.currentPassword, user.passwordHash)))
      throw new HttpError(
        400,
        $localize`:title of an error answer:Wrong current password`,
        $localize`Your current password is not right.`,
        [
          {
            field: 'currentPassword',
            message: $localize`:field error after the field's name:is not your current password`,
          },
        ],
        '/problems/wrong-current-password',
      );
    if (input.newPassword === input.currentPassword)
      throw new HttpError(
        400,
        $localize`:title of an error answer:Same password`,
        $localize`Choose a new password different from the current one.`,
        [
          {
            field: 'newPassword',
            message: $localize`:field error after the field's name:is the same as the current password`,
          },
        ],
        '/problems/same-password',
      );
    const passwordHash = await hashPassword(input.newPassword);
    await this.scope.manager.query(
      `UPDATE app_user SET "passwordHash" = $2, "tokenVersion" = "tokenVersion" + 1 WHERE id = $1`,
      [auth.userId, passwordHash],
    );
  }
}

/** The locale dates and times are written in for a person: their stored one, else the club's (CLUB_LOCALE). */
export async function localeOf(manager: EntityManager, userId: string, fallback: string): Promise<string> {
  const user = await manager
    .getRepository(User)
    .findOne({ where: { id: userId }, select: { id: true, locale: true } });
  return usableLocale(user?.locale, fallback);
}
