import { AbstractControl, FormGroup } from '@angular/forms';
import { problemFieldSentences, problemMessage } from '../http/problem-message';
import type { FieldErrors } from './schema-validator';

/**
 * Pins field messages (from the schema check or from a server 400) to the form's controls.
 * Returns the messages no control matched, so the page can show them above the form.
 */
export function applyFieldErrors(form: FormGroup, errors: FieldErrors): string[] {
  const unmatched: string[] = [];
  for (const [path, message] of Object.entries(errors)) {
    const control = findControl(form, path);
    if (control) {
      control.setErrors({ ...(control.errors ?? {}), message });
      control.markAsTouched();
    } else {
      unmatched.push(message);
    }
  }
  return unmatched;
}

/**
 * Shows a refused save on its form: each field's message under its control, read after the
 * field's label (`labels`, keyed by the server's field names). Returns the message for above the
 * form: the whole problem when no field was named or a named field has no control; else null.
 */
export function showProblem(
  form: FormGroup,
  error: unknown,
  labels: Readonly<Record<string, string>>,
): string | null {
  const fields = problemFieldSentences(error, labels);
  const unmatched = applyFieldErrors(form, fields);
  return unmatched.length || !Object.keys(fields).length ? problemMessage(error) : null;
}

/** The control a path names, else its nearest named parent ("recipients.2" → recipients). */
function findControl(form: FormGroup, path: string): AbstractControl | null {
  const parts = path.replace(/^\//, '').split(/[./]/).filter(Boolean);
  for (let end = parts.length; end > 0; end--) {
    const control = form.get(parts.slice(0, end).join('.'));
    if (control && control !== form) return control;
  }
  return parts.length ? form.get(parts[parts.length - 1]) : null;
}

/** The message to show under a control: the pinned one, else a plain reading of Angular's own keys. */
export function controlMessage(control: AbstractControl | null, label: string): string | null {
  if (!control || !control.errors) return null;
  const errors = control.errors;
  if (typeof errors['message'] === 'string') return errors['message'];
  if (errors['notNumber']) return $localize`${label}:field: must be a number, written in digits.`;
  if (errors['required']) return $localize`${label}:field: is needed.`;
  if (errors['email']) return $localize`${label}:field: must be an e-mail address like name@example.org.`;
  if (errors['min']) return $localize`${label}:field: must be at least ${errors['min'].min}:limit:.`;
  if (errors['max']) return $localize`${label}:field: must be at most ${errors['max'].max}:limit:.`;
  if (errors['above']) return $localize`${label}:field: must be more than ${errors['above'].above}:limit:.`;
  if (errors['below']) return $localize`${label}:field: must be less than ${errors['below'].below}:limit:.`;
  if (errors['wholeNumber']) return $localize`${label}:field: must be a whole number.`;
  if (errors['minlength'])
    return $localize`${label}:field: needs at least ${errors['minlength'].requiredLength}:limit: characters.`;
  return $localize`${label}:field: is not valid.`;
}
