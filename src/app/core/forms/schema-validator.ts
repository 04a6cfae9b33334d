import type { ErrorObject } from 'ajv';

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

function fieldPath(error: ErrorObject): string {
  const base = error.instancePath.replace(/^\//, '').split('/').filter(Boolean).join('.');
  if (error.keyword === 'required') {
    const missing = (error.params as { missingProperty: string }).missingProperty;
    return base ? `${base}.${missing}` : missing;
  }
  return base || '_';
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
      return `${label} is needed.`;
    case 'minLength':
      return params['limit'] === 1
        ? `${label} is needed.`
        : `${label} needs at least ${params['limit']} characters.`;
    case 'maxLength':
      return `${label} can have at most ${params['limit']} characters.`;
    case 'minimum':
      return `${label} must be at least ${params['limit']}.`;
    case 'maximum':
      return `${label} must be at most ${params['limit']}.`;
    case 'exclusiveMinimum':
      return `${label} must be more than ${params['limit']}.`;
    case 'minItems':
      return `${label}: pick at least ${params['limit']}.`;
    case 'maxItems':
      return `${label}: at most ${params['limit']}.`;
    case 'type':
      return params['type'] === 'integer' || params['type'] === 'number'
        ? `${label} must be a number${params['type'] === 'integer' ? ' without decimals' : ''}.`
        : `${label} is not filled in the right way.`;
    case 'multipleOf':
      return `${label} must be a whole number.`;
    case 'enum':
      return `${label}: choose one of the options.`;
    case 'format':
      if (params['format'] === 'email') return `${label} must be an e-mail address like name@example.org.`;
      if (params['format'] === 'date') return `${label} must be a date.`;
      if (params['format'] === 'time') return `${label} must be a time like 10:30.`;
      return `${label} is not in the expected form.`;
    case 'pattern': {
      const description = (error.parentSchema as { description?: string } | undefined)?.description;
      return description ? `${label}: ${description}` : `${label} is not in the expected form.`;
    }
    default:
      return `${label} is not valid.`;
  }
}
