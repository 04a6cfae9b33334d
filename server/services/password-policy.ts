import '../../shared/i18n/localize';
import { dictionary } from '@zxcvbn-ts/language-common';
import { badRequest, type HttpError } from '../http/problem';

/**
 * Judges a password someone chooses: creating a club, accepting an invitation, changing it, and
 * choosing a new one from an e-mailed link all come through here (`refuseCommonPassword` in
 * server/middleware/new-password.ts). Its length is the JSON Schema's `password` definition,
 * checked before this runs and tied to MIN_PASSWORD_LENGTH (shared/types/password-rules.ts) by
 * tests/tooling/password-rules.spec.ts. Signing in judges nothing, so older passwords still work.
 */

/** Said under the field when a chosen password is on the list, in the reader's language. */
export function commonPasswordMessage(): string {
  return $localize`This password is one of the most commonly used ones, so it is easy to guess. Choose another.`;
}

/**
 * The most common passwords (about 49,000, from @zxcvbn-ts/language-common), lower-cased, held
 * in memory for the life of the process. OWASP ASVS 4.0 2.1.7: passwords are checked against a
 * set of breached or common passwords.
 */
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  dictionary['passwords-common'].map((password) => password.toLowerCase()),
);

/** True when the password, ignoring case, is one of the most common ones. */
export function isCommonPassword(password: string): boolean {
  return COMMON_PASSWORDS.has(password.toLowerCase());
}

/** The 400 for a new password that may not be chosen, naming its field; null when it may. */
export function newPasswordRefusal(password: string, field: string): HttpError | null {
  if (!isCommonPassword(password)) return null;
  return badRequest($localize`Choose a password that is harder to guess.`, [
    { field, message: commonPasswordMessage() },
  ]);
}
