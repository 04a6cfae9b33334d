import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from '../http/problem';

const PROBLEM_TYPE = 'application/problem+json';

/** Unknown /api/* paths (and anything else nothing answered). */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'Not found', `Nothing answers ${req.method} ${req.originalUrl.split('?')[0]}.`));
};

/** Maps errors thrown by body parsers, multer and the database onto problems. */
function asHttpError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  const e = error as { type?: string; status?: number; code?: string; message?: string; field?: string };
  if (e?.type === 'entity.too.large' || e?.code === 'LIMIT_FILE_SIZE') {
    return new HttpError(413, 'Payload too large', 'The request body is larger than this route accepts.');
  }
  if (e?.type === 'entity.parse.failed') {
    return new HttpError(
      400,
      'Malformed JSON',
      'The request body is not valid JSON.',
      undefined,
      '/problems/malformed-json',
    );
  }
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported') {
    return new HttpError(415, 'Unsupported media type', 'Send the body as UTF-8 JSON.');
  }
  if (typeof e?.code === 'string' && e.code.startsWith('LIMIT_')) {
    return new HttpError(
      400,
      'Invalid upload',
      e.message ?? 'The upload was rejected.',
      e.field ? [{ field: e.field, message: e.message ?? 'rejected' }] : undefined,
    );
  }
  // PostgreSQL: invalid text representation (e.g. a malformed uuid) or numeric out of range.
  if (e?.code === '22P02' || e?.code === '22003' || e?.code === '22007' || e?.code === '22008') {
    return new HttpError(
      400,
      'Invalid request',
      'A value in the request is not valid.',
      undefined,
      '/problems/validation',
    );
  }
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500) {
    return new HttpError(e.status, 'Bad request', e.message);
  }
  return new HttpError(500, 'Internal error', 'Something went wrong on our side. It has been logged.');
}

/**
 * Last middleware: every error becomes application/problem+json, never a stack trace. The
 * instance is the path without its query, which may carry a token.
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const problem = asHttpError(error);
  if (problem.status >= 500) req.log?.error({ err: error }, 'request failed');
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
