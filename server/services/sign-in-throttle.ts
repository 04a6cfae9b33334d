import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import { tooManyRequests } from '../http/problem';

/** Wrong passwords for one address within WINDOW_MINUTES before it is locked. */
export const MAX_FAILURES = 10;
export const WINDOW_MINUTES = 15;
/** How long a locked address waits (choosing a new password by e-mail unlocks it at once). */
export const LOCK_MINUTES = 15;

/**
 * Guessing one account's password from many addresses or instances: wrong passwords are counted
 * per e-mail address in PostgreSQL (the same for addresses with no account, so the lock tells no
 * one which addresses exist). Checked before the password is, so a locked address costs no hash.
 */
export async function refuseIfLocked(manager: EntityManager, email: string): Promise<void> {
  const rows = (await manager.query(
    `SELECT ceil(extract(epoch FROM "lockedUntil" - now()))::int AS seconds
       FROM sign_in_throttle WHERE email = $1 AND "lockedUntil" > now()`,
    [email],
  )) as { seconds: number }[];
  const seconds = rows[0]?.seconds;
  if (seconds === undefined) return;
  const minutes = Math.ceil(seconds / 60);
  throw tooManyRequests(
    $localize`:title of an error answer:Too many wrong passwords`,
    minutes === 1
      ? $localize`:the quoted words are the sign-in page's link to a new password:Too many wrong passwords for this account. Try again in 1 minute, or choose a new password with "Forgot your password?".`
      : $localize`:the quoted words are the sign-in page's link to a new password:Too many wrong passwords for this account. Try again in ${minutes}:minutes: minutes, or choose a new password with "Forgot your password?".`,
    seconds,
    '/problems/too-many-wrong-passwords',
  );
}

/** Counts a wrong password; the MAX_FAILURES-th within the window locks the address. */
export async function countFailure(manager: EntityManager, email: string): Promise<void> {
  await manager.query(
    `INSERT INTO sign_in_throttle AS t (email, failures, "windowStart", "lockedUntil")
     VALUES ($1, 1, now(), NULL)
     ON CONFLICT (email) DO UPDATE SET
       failures = CASE WHEN t."windowStart" < now() - make_interval(mins => $2) THEN 1 ELSE t.failures + 1 END,
       "windowStart" = CASE WHEN t."windowStart" < now() - make_interval(mins => $2) THEN now() ELSE t."windowStart" END,
       "lockedUntil" = CASE
         WHEN t."windowStart" >= now() - make_interval(mins => $2) AND t.failures + 1 >= $3
         THEN now() + make_interval(mins => $4)
         ELSE t."lockedUntil" END`,
    [email, WINDOW_MINUTES, MAX_FAILURES, LOCK_MINUTES],
  );
}

/** Forgets the count: a right password, or a new one chosen by e-mail. */
export async function clearFailures(manager: EntityManager, email: string): Promise<void> {
  await manager.query(`DELETE FROM sign_in_throttle WHERE email = $1`, [email]);
}
