import { createHash, randomBytes } from 'node:crypto';
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
    'Link not usable',
    'This link was used already or is out of date. Ask for a new one.',
    [{ field: 'token', message: 'is used or out of date' }],
  );
}
