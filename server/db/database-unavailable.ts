/**
 * SQLSTATEs that say the database cannot serve at the moment, whatever was asked: the server is
 * shutting down or starting (57P01 admin_shutdown, 57P02 crash_shutdown, 57P03
 * cannot_connect_now), a statement ran past statement_timeout (57014 query_canceled), every
 * connection slot is taken (53300 too_many_connections). Class 08 (connection exceptions) is
 * matched as a whole.
 */
const UNAVAILABLE_STATES = new Set(['57P01', '57P02', '57P03', '57014', '53300']);

/** Socket errors met while connecting to the database or talking to it. */
const SOCKET_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EAI_AGAIN',
]);

/**
 * What node-postgres and its pool say when a connection is lost, cannot be made in time (the
 * pool's connectionTimeoutMillis, also spent waiting for a free connection) or was closed.
 */
const DRIVER_MESSAGES = [
  /^Connection terminated/,
  /^timeout exceeded when trying to connect$/,
  /is not queryable$/,
  /^Cannot use a pool after calling end on the pool$/,
];

interface ErrorLike {
  code?: unknown;
  message?: unknown;
  /** TypeORM's QueryFailedError keeps the driver's own error here. */
  driverError?: unknown;
  cause?: unknown;
  /** AggregateError: one per address tried while connecting. */
  errors?: unknown;
}

/**
 * Whether an error means the database is out of reach or refusing work for now, so that asking
 * again shortly may succeed (a 503, not a 500). Errors about the request itself are not.
 */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== 'object' || depth > 3) return false;
  const e = error as ErrorLike;
  if (typeof e.code === 'string') {
    if (UNAVAILABLE_STATES.has(e.code) || /^08[0-9A-Z]{3}$/.test(e.code) || SOCKET_CODES.has(e.code))
      return true;
  }
  if (typeof e.message === 'string' && DRIVER_MESSAGES.some((pattern) => pattern.test(e.message as string)))
    return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1)))
    return true;
  return isDatabaseUnavailable(e.driverError, depth + 1) || isDatabaseUnavailable(e.cause, depth + 1);
}
