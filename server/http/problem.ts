import type { ProblemDto } from '../../shared/types/api';

/** `row`: the line of an uploaded file the error is about. */
export type FieldError = { field: string; message: string; row?: number };

/** An error that becomes an RFC 9457 problem response. Services throw these. */
export class HttpError extends Error {
  /** Seconds after which asking again can succeed: sent as Retry-After (with 429 and 503). */
  retryAfterSeconds?: number;

  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail?: string,
    readonly errors?: FieldError[],
    readonly type = `/problems/${slug(title)}`,
  ) {
    super(detail ?? title);
  }

  toProblem(instance?: string): ProblemDto {
    const problem: ProblemDto = { type: this.type, title: this.title, status: this.status };
    if (this.detail) problem.detail = this.detail;
    if (instance) problem.instance = instance;
    if (this.errors?.length) problem.errors = this.errors;
    return problem;
  }
}

function slug(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

export const badRequest = (detail: string, errors?: FieldError[]) =>
  new HttpError(400, 'Invalid request', detail, errors, '/problems/validation');
export const unauthorized = (detail = 'Sign in to continue.') => new HttpError(401, 'Unauthorized', detail);
export const forbidden = (detail = 'Your role does not allow this.') =>
  new HttpError(403, 'Forbidden', detail);
export const notFound = (what = 'resource') => new HttpError(404, 'Not found', `No such ${what}.`);
export const conflict = (detail: string) => new HttpError(409, 'Conflict', detail);
/** 429 with Retry-After: a limit that lifts by itself after `seconds`. */
export function tooManyRequests(title: string, detail: string, seconds: number): HttpError {
  const error = new HttpError(429, title, detail);
  error.retryAfterSeconds = Math.max(1, Math.ceil(seconds));
  return error;
}
export const payloadTooLarge = (detail: string) => new HttpError(413, 'Payload too large', detail);
