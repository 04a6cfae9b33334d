import type { ProblemDto } from '../../shared/types/api';
import { type FieldError, HttpError } from './problem';

/** A problem with extra members (RFC 9457 allows them), e.g. the current revision on a 409. */
export class DetailedProblem extends HttpError {
  constructor(
    status: number,
    title: string,
    detail: string,
    readonly extras: Record<string, unknown>,
    errors?: FieldError[],
    type?: string,
  ) {
    super(status, title, detail, errors, type);
  }

  override toProblem(instance?: string): ProblemDto {
    return { ...this.extras, ...super.toProblem(instance) };
  }
}

/** The revision or version an If-Match header names ("3", W/"3" or 3), or null when absent. */
export function ifMatchNumber(header: string | undefined): number | null | 'invalid' {
  if (header === undefined || header.trim() === '') return null;
  const match = /^\s*(?:W\/)?"?(\d{1,9})"?\s*$/.exec(header);
  return match ? Number(match[1]) : 'invalid';
}
