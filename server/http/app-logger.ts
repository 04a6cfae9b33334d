import { pino, stdSerializers, type DestinationStream, type Logger, type LoggerOptions } from 'pino';
import { QueryFailedError } from 'typeorm';

/** What a log line shows in place of a secret. */
export const SECRET = '[secret]';

/** Fields that hold a secret wherever they sit in a logged object (up to four levels down). */
const SECRET_FIELDS = ['password', 'currentPassword', 'newPassword', 'token'];

/** Paths pino's redact replaces with SECRET: sign-in headers and the secret fields at any depth written. */
export const REDACTED_PATHS = [
  ...['authorization', 'cookie'].flatMap((header) => [
    `headers.${header}`,
    `*.headers.${header}`,
    `*.*.headers.${header}`,
  ]),
  'headers["set-cookie"]',
  '*.headers["set-cookie"]',
  ...SECRET_FIELDS.flatMap((field) => [field, `*.${field}`, `*.*.${field}`, `*.*.*.${field}`]),
];

/** PostgreSQL's own errors (node-postgres' DatabaseError) carry a severity and a routine. */
function isDatabaseError(error: Error): boolean {
  const fields = error as unknown as Record<string, unknown>;
  return error instanceof QueryFailedError || (typeof fields['severity'] === 'string' && 'routine' in fields);
}

/** What a database error says without the values it was given. */
const DATABASE_ERROR_FIELDS = ['code', 'constraint', 'table', 'column', 'routine'] as const;

/**
 * An error as it is logged. A database error (TypeORM's QueryFailedError, or pg's own) keeps its
 * type, message, code, constraint, table and stack, but never its statement (`query`), its values
 * (`parameters`) or PostgreSQL's `detail`, which repeats the values ("Key (email)=(…)"): those may
 * be a child's name, an e-mail address or a password hash. Other errors are logged as pino's
 * standard serializer writes them.
 */
export function errorForLog(error: unknown): unknown {
  if (!(error instanceof Error)) return error;
  if (isDatabaseError(error)) {
    const source = error as unknown as Record<string, unknown>;
    const driver = (source['driverError'] ?? {}) as Record<string, unknown>;
    const logged: Record<string, unknown> = { type: error.constructor.name, message: error.message };
    for (const field of DATABASE_ERROR_FIELDS) {
      const value = source[field] ?? driver[field];
      if (typeof value === 'string') logged[field] = value;
    }
    logged['stack'] = error.stack;
    return logged;
  }
  const logged = stdSerializers.err(error) as unknown as Record<string, unknown>;
  if (error.cause instanceof Error) logged['cause'] = errorForLog(error.cause);
  return logged;
}

/** The logger settings every server process uses: secrets censored, database errors without values. */
export function loggerOptions(level: string): LoggerOptions {
  return {
    level,
    redact: { paths: REDACTED_PATHS, censor: SECRET },
    serializers: { err: errorForLog },
  };
}

/** The server's logger (to stdout, or to `destination`). */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  return destination ? pino(loggerOptions(level), destination) : pino(loggerOptions(level));
}
