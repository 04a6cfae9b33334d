import { HttpErrorResponse } from '@angular/common/http';
import type { ProblemDto } from '../../../../shared/types';

/**
 * Turns an API error into words a coach can act on. With `fields` false the field errors are left
 * out: for forms that show each under its own input already.
 */
export function problemMessage(error: unknown, { fields: withFields = true } = {}): string {
  if (error instanceof HttpErrorResponse) {
    if (error.status === 0)
      return $localize`Conewise cannot reach the server. Check the connection and try again.`;
    const problem = error.error as Partial<ProblemDto> | null;
    if (problem && typeof problem === 'object') {
      const fields = withFields
        ? problem.errors?.map((e) => `${e.field}: ${e.message}`).join('; ')
        : undefined;
      const head = problem.detail ?? problem.title;
      if (head && fields) return `${head} (${fields})`;
      if (head) return head;
    }
    if (error.status === 403) return $localize`Your role in the club does not allow this.`;
    if (error.status === 404) return $localize`That was not found. It may have been removed.`;
    if (error.status >= 500)
      return $localize`Something went wrong on the server. Nothing you saved was lost; try again.`;
  }
  return $localize`Something went wrong. Try again.`;
}

/** Field errors of a 400 problem, keyed by field name, for showing under form inputs. */
export function problemFieldErrors(error: unknown): Record<string, string> {
  if (!(error instanceof HttpErrorResponse)) return {};
  const problem = error.error as Partial<ProblemDto> | null;
  const result: Record<string, string> = {};
  for (const item of problem?.errors ?? []) result[item.field] = item.message;
  return result;
}

/**
 * Field errors of a 400 problem as whole sentences, keyed by field name. The server words most
 * fields as a fragment ("is not your password"): with a label for the field it reads after the
 * label ("Your password is not your password."); a whole sentence (a capital first) stays as it is.
 */
export function problemFieldSentences(
  error: unknown,
  labels: Readonly<Record<string, string>>,
): Record<string, string> {
  return Object.fromEntries(
    Object.entries(problemFieldErrors(error)).map(([field, text]) => {
      const label = labels[field];
      return [
        field,
        label && /^[a-z]/.test(text)
          ? $localize`:A field's name, then the server's words about it:${label}:field: ${text}:problem:.`
          : text,
      ];
    }),
  );
}
