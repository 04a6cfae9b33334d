import '../../shared/i18n/localize';
import type { ProblemDto } from '../../shared/types/api';

/** `row`: the line of an uploaded file the error is about. */
export type FieldError = { field: string; message: string; row?: number };

/**
 * An error that becomes an RFC 9457 problem response. Services throw these. Its `title` and
 * `detail` are in the reader's language; its `type` is not: a title marked for translation comes
 * with its `type` given, because the default is made from the title's words.
 */
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
  new HttpError(
    400,
    $localize`:title of an error answer:Invalid request`,
    detail,
    errors,
    '/problems/validation',
  );
export const unauthorized = (detail?: string) =>
  new HttpError(
    401,
    $localize`:title of an error answer:Unauthorized`,
    detail ?? $localize`Sign in to continue.`,
    undefined,
    '/problems/unauthorized',
  );
export const forbidden = (detail?: string) =>
  new HttpError(
    403,
    $localize`:title of an error answer:Forbidden`,
    detail ?? $localize`Your role does not allow this.`,
    undefined,
    '/problems/forbidden',
  );

/** What a 404 is about, as its detail names it ("No such team."). */
export type Missing =
  | 'resource'
  | 'team'
  | 'player'
  | 'plan'
  | 'rule set'
  | 'member'
  | 'invitation'
  | 'calendar'
  | 'scheduled session'
  | 'helper link'
  | 'Club';

/** "No such team.": each as a whole sentence, so a translation can say it its own way. */
function noSuch(what: Missing): string {
  switch (what) {
    case 'team':
      return $localize`No such team.`;
    case 'player':
      return $localize`No such player.`;
    case 'plan':
      return $localize`No such plan.`;
    case 'rule set':
      return $localize`No such rule set.`;
    case 'member':
      return $localize`No such member.`;
    case 'invitation':
      return $localize`No such invitation.`;
    case 'calendar':
      return $localize`No such calendar.`;
    case 'scheduled session':
      return $localize`No such scheduled session.`;
    case 'helper link':
      return $localize`No such helper link.`;
    case 'Club':
      return $localize`:the club is not found:No such Club.`;
    case 'resource':
      return $localize`No such resource.`;
  }
}

export const notFound = (what: Missing = 'resource') =>
  new HttpError(
    404,
    $localize`:title of an error answer:Not found`,
    noSuch(what),
    undefined,
    '/problems/not-found',
  );
export const conflict = (detail: string) =>
  new HttpError(409, $localize`:title of an error answer:Conflict`, detail, undefined, '/problems/conflict');
/** 429 with Retry-After: a limit that lifts by itself after `seconds`. */
export function tooManyRequests(title: string, detail: string, seconds: number, type: string): HttpError {
  const error = new HttpError(429, title, detail, undefined, type);
  error.retryAfterSeconds = Math.max(1, Math.ceil(seconds));
  return error;
}
export const payloadTooLarge = (detail: string) =>
  new HttpError(
    413,
    $localize`:title of an error answer:Payload too large`,
    detail,
    undefined,
    '/problems/payload-too-large',
  );
