import { FormGroup } from '@angular/forms';
import { applyFieldErrors } from './form-errors';
import { loadApiSchema, SchemaName } from './api-schemas';
import { schemaCheck } from './schema-validator';

/**
 * Validates a form's value with the server's JSON Schema before it is sent. Pins each message to
 * its field; returns false (and the messages that belong to no field) when something is wrong.
 */
export async function checkAgainstSchema(
  form: FormGroup,
  name: SchemaName,
  value: unknown,
  labels: Record<string, string> = {},
): Promise<{ ok: boolean; unmatched: string[] }> {
  form.markAllAsTouched();
  if (form.invalid) return { ok: false, unmatched: [] };
  const schema = await loadApiSchema(name);
  if (!schema) return { ok: true, unmatched: [] };
  const errors = (await schemaCheck(schema, labels))(value);
  if (Object.keys(errors).length === 0) return { ok: true, unmatched: [] };
  return { ok: false, unmatched: applyFieldErrors(form, errors) };
}
