import type { ErrorObject } from 'ajv';
import { errorPath } from '../../../../shared/schemas/error-path';
import { schemaWords } from '../../../../shared/i18n/schema-words';

/** Field path ("email", "usualSpace.width") → a message in plain words. */
export type FieldErrors = Record<string, string>;

/** Checks a form value against a JSON Schema and names each bad field. */
export type SchemaCheck = (value: unknown) => FieldErrors;

/** A standalone ajv validator: true when valid, else its errors left on `.errors`. */
type Validate = ((value: unknown) => boolean) & { errors?: ErrorObject[] | null };

const cache = new Map<object, Promise<Validate>>();

/**
 * Checks against the server's own JSON Schema (shared/schemas), with the validator precompiled for
 * it by server/cli/generate-validators.ts: nothing is compiled in the browser, so the CSP needs
 * no 'unsafe-eval'. The validators load only when a form first needs one.
 */
export async function schemaCheck(schema: object, labels: Record<string, string> = {}): Promise<SchemaCheck> {
  let pending = cache.get(schema);
  if (!pending) {
    pending = compile(schema);
    cache.set(schema, pending);
  }
  const validate = await pending;
  return (value: unknown) => (validate(value) ? {} : describeErrors(validate.errors ?? [], labels));
}

async function compile(schema: object): Promise<Validate> {
  const id = (schema as { $id?: unknown }).$id;
  const validators: Record<string, Validate> = (await import('./generated/api-validators')).validatorsById;
  const validate = typeof id === 'string' ? validators[id] : undefined;
  if (!validate) {
    throw new Error(
      `No precompiled validator for schema ${String(id)}: add it to server/cli/validator-sources.ts`,
    );
  }
  return validate;
}

/** One message per field: the first error ajv reports for it, in words a coach reads. */
export function describeErrors(errors: ErrorObject[], labels: Record<string, string> = {}): FieldErrors {
  const result: FieldErrors = {};
  for (const error of errors) {
    const path = fieldPath(error);
    if (result[path]) continue;
    result[path] = plainMessage(error, labels[path] ?? humanise(path));
  }
  return result;
}

/** The field as Angular names its control ("space.width"), "_" for the whole value. */
function fieldPath(error: ErrorObject): string {
  return errorPath(error).join('.') || '_';
}

function humanise(path: string): string {
  const last = path.split('.').pop() ?? path;
  const words = last.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function plainMessage(error: ErrorObject, label: string): string {
  const params = error.params as Record<string, unknown>;
  switch (error.keyword) {
    case 'required':
      return $localize`${label}:field: is needed.`;
    case 'minLength':
      return params['limit'] === 1
        ? $localize`${label}:field: is needed.`
        : $localize`${label}:field: needs at least ${params['limit']}:limit: characters.`;
    case 'maxLength':
      return $localize`${label}:field: can have at most ${params['limit']}:limit: characters.`;
    case 'minimum':
      return $localize`${label}:field: must be at least ${params['limit']}:limit:.`;
    case 'maximum':
      return $localize`${label}:field: must be at most ${params['limit']}:limit:.`;
    case 'exclusiveMinimum':
      return $localize`${label}:field: must be more than ${params['limit']}:limit:.`;
    case 'minItems':
      return $localize`${label}:field:: pick at least ${params['limit']}:limit:.`;
    case 'maxItems':
      return $localize`${label}:field:: at most ${params['limit']}:limit:.`;
    case 'type':
      if (params['type'] === 'integer') return $localize`${label}:field: must be a number without decimals.`;
      if (params['type'] === 'number') return $localize`${label}:field: must be a number.`;
      return $localize`${label}:field: is not filled in the right way.`;
    case 'multipleOf':
      return $localize`${label}:field: must be a whole number.`;
    case 'enum':
      return $localize`${label}:field:: choose one of the options.`;
    case 'format':
      if (params['format'] === 'email')
        return $localize`${label}:field: must be an e-mail address like name@example.org.`;
      if (params['format'] === 'date') return $localize`${label}:field: must be a date.`;
      if (params['format'] === 'time') return $localize`${label}:field: must be a time like 10:30.`;
      return $localize`${label}:field: is not in the expected form.`;
    case 'pattern': {
      const written = (error.parentSchema as { description?: string } | undefined)?.description;
      const description = written && schemaWords(written);
      return description
        ? $localize`:A field's name, then the schema's words on how to write it:${label}:field:: ${description}:rule:`
        : $localize`${label}:field: is not in the expected form.`;
    }
    default:
      return $localize`${label}:field: is not valid.`;
  }
}
