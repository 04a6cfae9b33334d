import '../../shared/i18n/localize';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { isDatabaseUnavailable } from '../db/database-unavailable';
import { HttpError } from '../http/problem';
import { inLanguage } from '../i18n/translations';
import { languageFor } from './request-language';

const PROBLEM_TYPE = 'application/problem+json';

/** Retry-After of a 503 while the database is out of reach: a restart takes a few seconds. */
export const DATABASE_RETRY_AFTER_SECONDS = 2;

/** Unknown /api/* paths (and anything else nothing answered). */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  const method = req.method;
  const path = req.originalUrl.split('?')[0];
  next(
    new HttpError(
      404,
      $localize`:title of an error answer:Not found`,
      $localize`:no route answers this method and path:Nothing answers ${method}:method: ${path}:path:.`,
      undefined,
      '/problems/not-found',
    ),
  );
};

/** What a multer refusal says (its own words, marked for translation); null for a code it does not name. */
function uploadRefusal(code: string): string | null {
  switch (code) {
    case 'LIMIT_PART_COUNT':
      return $localize`:an upload refused:Too many parts`;
    case 'LIMIT_FILE_COUNT':
      return $localize`:an upload refused:Too many files`;
    case 'LIMIT_FIELD_KEY':
      return $localize`:an upload refused:Field name too long`;
    case 'LIMIT_FIELD_VALUE':
      return $localize`:an upload refused:Field value too long`;
    case 'LIMIT_FIELD_COUNT':
      return $localize`:an upload refused:Too many fields`;
    case 'LIMIT_UNEXPECTED_FILE':
      return $localize`:an upload refused:Unexpected file field`;
    default:
      return null;
  }
}

/**
 * Maps errors thrown by body parsers, multer and the database onto problems: a database out of
 * reach (restarting, refusing connections, a lost connection) is a 503 with Retry-After.
 */
function asHttpError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  const e = error as { type?: string; status?: number; code?: string; message?: string; field?: string };
  if (e?.type === 'entity.too.large' || e?.code === 'LIMIT_FILE_SIZE') {
    return new HttpError(
      413,
      $localize`:title of an error answer:Payload too large`,
      $localize`The request body is larger than this route accepts.`,
      undefined,
      '/problems/payload-too-large',
    );
  }
  if (e?.type === 'entity.parse.failed') {
    return new HttpError(
      400,
      $localize`:title of an error answer:Malformed JSON`,
      $localize`The request body is not valid JSON.`,
      undefined,
      '/problems/malformed-json',
    );
  }
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported') {
    return new HttpError(
      415,
      $localize`:title of an error answer:Unsupported media type`,
      $localize`Send the body as UTF-8 JSON.`,
      undefined,
      '/problems/unsupported-media-type',
    );
  }
  if (typeof e?.code === 'string' && e.code.startsWith('LIMIT_')) {
    const said = uploadRefusal(e.code) ?? e.message;
    return new HttpError(
      400,
      $localize`:title of an error answer:Invalid upload`,
      said ?? $localize`The upload was rejected.`,
      e.field ? [{ field: e.field, message: said ?? $localize`:an upload refused:rejected` }] : undefined,
      '/problems/invalid-upload',
    );
  }
  // PostgreSQL: invalid text representation (e.g. a malformed uuid) or numeric out of range.
  if (e?.code === '22P02' || e?.code === '22003' || e?.code === '22007' || e?.code === '22008') {
    return new HttpError(
      400,
      $localize`:title of an error answer:Invalid request`,
      $localize`A value in the request is not valid.`,
      undefined,
      '/problems/validation',
    );
  }
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return new HttpError(
      e.status,
      $localize`:title of an error answer:Bad request`,
      e.message,
      undefined,
      '/problems/bad-request',
    );
  }
  if (isDatabaseUnavailable(error)) {
    const unavailable = new HttpError(
      503,
      $localize`:title of an error answer:Service unavailable`,
      $localize`The database cannot be reached just now. Try again in a few seconds.`,
      undefined,
      '/problems/database-unavailable',
    );
    unavailable.retryAfterSeconds = DATABASE_RETRY_AFTER_SECONDS;
    return unavailable;
  }
  return new HttpError(
    500,
    $localize`:title of an error answer:Internal error`,
    $localize`Something went wrong on our side. It has been logged.`,
    undefined,
    '/problems/internal-error',
  );
}

/**
 * Last middleware: every error becomes application/problem+json, never a stack trace. The
 * instance is the path without its query, which may carry a token. Problems made here speak the
 * reader's language even for errors raised before the request's language was set (a body that
 * is not JSON, or too large).
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const problem = inLanguage(languageFor(req), () => asHttpError(error));
  if (problem.type === '/problems/database-unavailable')
    req.log?.warn({ err: error }, 'database unavailable');
  else if (problem.status >= 500) req.log?.error({ err: error }, 'request failed');
  if (res.headersSent) {
    res.end();
    return;
  }
  if (problem.status === 401) res.setHeader('WWW-Authenticate', 'Bearer realm="conewise"');
  if (problem.retryAfterSeconds) res.setHeader('Retry-After', String(problem.retryAfterSeconds));
  res
    .status(problem.status)
    .type(PROBLEM_TYPE)
    .send(JSON.stringify(problem.toProblem(req.originalUrl.split('?')[0])));
};
