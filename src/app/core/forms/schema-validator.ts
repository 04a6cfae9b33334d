import type { ErrorObject, ValidateFunction } from 'ajv';
import { loadCommonSchemas } from './api-schemas';

/** Field path ("email", "usualSpace.width") → a message in plain words. */
export type FieldErrors = Record<string, string>;

/** Checks a form value against a JSON Schema and names each bad field. */
export type SchemaCheck = (value: unknown) => FieldErrors;

const cache = new Map<object, Promise<SchemaCheck>>();

/**
 * Compiles a JSON Schema with ajv, loading ajv only when a form first needs it so it stays out of
 * the initial bundle. The schemas are the server's own, from shared/schemas.
 */
export function schemaCheck(schema: object, labels: Record<string, string> = {}): Promise<SchemaCheck> {
  let pending = cache.get(schema);
  if (!pending) {
    pending = compile(schema).then((validate) => (value: unknown) => {
      if (validate(value)) return {};
      return describeErrors(validate.errors ?? [], labels);
    });
    cache.set(schema, pending);
  }
  return pending;
}

async function compile(schema: object): Promise<ValidateFunction> {
  const [{ default: Ajv }, { default: addFormats }, common] = await Promise.all([
    import('ajv'),
    import('ajv-formats'),
    loadCommonSchemas(),
  ]);
  const ajv = new Ajv({ allErrors: true, strict: false, verbose: true });
  addFormats(ajv);
  for (const shared of common) ajv.addSchema(shared);
  return ajv.compile(schema);
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
