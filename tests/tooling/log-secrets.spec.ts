/**
 * No secret reaches a log line: the server's logger settings censor sign-in headers and password
 * and token fields, and a failed database statement is logged without its text or its values.
 */
import type { Request, Response } from 'express';
import { QueryFailedError } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { createLogger, SECRET } from '../../server/http/app-logger';
import { errorHandler } from '../../server/middleware/error-handler';

/** The server's logger writing into an array, one JSON line per entry. */
function capturedLogger() {
  const lines: string[] = [];
  const logger = createLogger('info', { write: (line: string) => void lines.push(line) });
  return { logger, lines, text: () => lines.join('') };
}

describe('log lines keep no secrets', () => {
  it('censors authorization and cookie headers and password and token fields at any depth', () => {
    const { logger, text } = capturedLogger();
    logger.info(
      {
        req: {
          method: 'POST',
          headers: { authorization: 'Bearer eyJ-signed-token', cookie: 'session=cookie-value-1' },
        },
        res: { headers: { 'set-cookie': 'session=cookie-value-2' } },
        password: 'top-level-pass-1',
        body: {
          currentPassword: 'current-pass-2',
          newPassword: 'new-pass-3',
          account: { invitation: { token: 'invite-token-4' }, password: 'nested-pass-5' },
        },
        teamName: 'U9 Comets',
      },
      'a request with secrets in it',
    );
    const logged = text();
    for (const secret of [
      'eyJ-signed-token',
      'cookie-value-1',
      'cookie-value-2',
      'top-level-pass-1',
      'current-pass-2',
      'new-pass-3',
      'invite-token-4',
      'nested-pass-5',
    ]) {
      expect(logged).not.toContain(secret);
    }
    const entry = JSON.parse(logged);
    expect(entry.req.headers.authorization).toBe(SECRET);
    expect(entry.body.account.invitation.token).toBe(SECRET);
    // Everything else is kept as it was.
    expect(entry.teamName).toBe('U9 Comets');
    expect(entry.req.method).toBe('POST');
    expect(entry.msg).toBe('a request with secrets in it');
  });

  it('the error middleware logs a failed database statement without its text, values or detail', () => {
    const { logger, text } = capturedLogger();
    // As node-postgres reports a unique violation, and TypeORM wraps it with the statement.
    const driverError = Object.assign(
      new Error('duplicate key value violates unique constraint "UQ_app_user_email"'),
      {
        severity: 'ERROR',
        code: '23505',
        detail: 'Key (email)=(parent-of-mia@example.org) already exists.',
        constraint: 'UQ_app_user_email',
        table: 'app_user',
        routine: '_bt_check_unique',
      },
    );
    const error = new QueryFailedError(
      'INSERT INTO "app_user"("email", "passwordHash") VALUES ($1, $2)',
      ['parent-of-mia@example.org', '$argon2id$hash-of-a-password'],
      driverError,
    );
    const res = {
      headersSent: false,
      setHeader: () => res,
      status: () => res,
      type: () => res,
      send: () => res,
    };
    errorHandler(
      error,
      { log: logger, originalUrl: '/api/auth/register' } as unknown as Request,
      res as unknown as Response,
      () => undefined,
    );
    const logged = text();
    expect(logged).not.toContain('parent-of-mia@example.org');
    expect(logged).not.toContain('hash-of-a-password');
    expect(logged).not.toContain('INSERT INTO');
    const entry = JSON.parse(logged);
    expect(entry.msg).toBe('request failed');
    expect(entry.err).toMatchObject({
      type: 'QueryFailedError',
      message: 'duplicate key value violates unique constraint "UQ_app_user_email"',
      code: '23505',
      constraint: 'UQ_app_user_email',
      table: 'app_user',
    });
    expect(entry.err.stack).toContain('QueryFailedError');
  });

  it('an error caused by a database error is logged with that cause stripped the same way', () => {
    const { logger, text } = capturedLogger();
    const cause = new QueryFailedError(
      'UPDATE player SET "displayName" = $1',
      ['Mia Secret-Surname'],
      new Error('boom'),
    );
    logger.error({ err: new Error('saving the squad failed', { cause }) }, 'failed');
    const logged = text();
    expect(logged).not.toContain('Mia Secret-Surname');
    expect(logged).not.toContain('UPDATE player');
    expect(JSON.parse(logged).err.message).toContain('saving the squad failed');
  });
});
