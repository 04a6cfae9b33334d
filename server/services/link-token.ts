import '../../shared/i18n/localize';
import { createHash, randomBytes } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { HttpError } from '../http/problem';

/**
 * The secret of a link Conewise mails or hands out (invitation, password reset, address
 * confirmation, helper view, calendar feed): 32 random bytes as base64url, 43 characters.
 */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What is stored instead of a link's secret: its SHA-256 in hex, so a database copy opens nothing. */
export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** The answer to a single-use link (reset, confirmation) that was used already or is out of date. */
export function linkUnusable(): HttpError {
  return new HttpError(
    400,
    $localize`:title of an error answer:Link not usable`,
    $localize`This link was used already or is out of date. Ask for a new one.`,
    [{ field: 'token', message: $localize`:field error after the field's name:is used or out of date` }],
    '/problems/link-not-usable',
  );
}

/** Tables of single-use links mailed to a person: each row has userId, tokenHash, expiresAt, usedAt. */
export type MailedLinkTable = 'password_reset' | 'email_verification';

/**
 * Links of `table` sent to the person in the last hour. Locks the person's row first, so two
 * requests at once cannot both count below an hourly limit. Call inside a transaction.
 */
export async function linksSentInLastHour(
  manager: EntityManager,
  table: MailedLinkTable,
  userId: string,
): Promise<number> {
  await manager.query('SELECT id FROM app_user WHERE id = $1 FOR UPDATE', [userId]);
  const [{ recent }] = (await manager.query(
    `SELECT count(*)::int AS recent FROM ${table}
      WHERE "userId" = $1 AND "createdAt" > now() - interval '1 hour'`,
    [userId],
  )) as [{ recent: number }];
  return recent;
}

/**
 * Uses a mailed link: marks it used if it is unused and in date, in one statement so it works
 * once, and answers whose it was; else throws linkUnusable. Call inside a transaction.
 */
export async function claimLink(
  manager: EntityManager,
  table: MailedLinkTable,
  token: string,
): Promise<string> {
  // For UPDATE … RETURNING the postgres driver answers [rows, affected].
  const [claimed] = (await manager.query(
    `UPDATE ${table} SET "usedAt" = now()
      WHERE "tokenHash" = $1 AND "usedAt" IS NULL AND "expiresAt" > now()
      RETURNING "userId"`,
    [hashLinkToken(token)],
  )) as [{ userId: string }[], number];
  const userId = claimed[0]?.userId;
  if (!userId) throw linkUnusable();
  return userId;
}
