/**
 * The rules for a password someone chooses (creating a club, joining from an invitation, changing
 * it, choosing a new one from an e-mailed link). The client's validators and hints read them here;
 * the JSON Schemas cannot import, so tests/tooling/password-rules.spec.ts checks that every
 * password definition in shared/schemas says the same. Signing in takes any length, so passwords
 * chosen under an older, shorter minimum still work.
 */
import '../i18n/localize';

/** The fewest characters of a new password: OWASP ASVS 4.0 2.1.1 (at least 12 characters). */
export const MIN_PASSWORD_LENGTH = 12;

/** The hint under a new-password field, in the reader's language (made on each call). */
export function passwordHint(): string {
  return $localize`At least ${MIN_PASSWORD_LENGTH}:count: characters, and not one of the most common passwords.`;
}
