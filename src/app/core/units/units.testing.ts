/** For component specs: a signed-in person who reads yards and °F, and what metric text looks like. */
import type { Role } from '../../../../shared/types';
import { NEW_CLUB_UNIT_FIELDS, type Units } from '../../../../shared/units';
import type { AuthStore } from '../auth/auth-store';

export const YARDS_AND_FAHRENHEIT: Units = { distance: 'yards', temperature: 'fahrenheit' };

/** A metric size, length, area or temperature in text ("12 × 20 m", "9 m", "4 m²", "30 °C"). */
export const METRIC_WORDS = /\d m(?![\w])|\d m²|°C/;

/** Signs a person of a club in, reading `units` (the club's setting left at metres and °C). */
export function signInReading(auth: AuthStore, units: Units, role: Role = 'coach'): void {
  auth.signIn({
    token: 't',
    user: {
      id: 'u1',
      name: 'Robin Reader',
      email: 'robin@example.org',
      emailVerified: true,
      clubId: 'c1',
      clubName: 'Club',
      role,
      ...NEW_CLUB_UNIT_FIELDS,
      units,
      ownUnits: units,
    },
  });
}
