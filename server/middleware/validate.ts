import '../../shared/i18n/localize';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv, { type ErrorObject, type ValidateFunction } from 'ajv';
import addFormats from 'ajv-formats';
import { errorPath } from '../../shared/schemas/error-path';
import type { RequestHandler } from 'express';
import { PROJECT_ROOT } from '../config';
import { badRequest, type FieldError } from '../http/problem';
import { schemaWords } from '../../shared/i18n/schema-words';

/** The JSON Schemas shared with the client: shared/schemas/api/<name>.schema.json. */
export const API_SCHEMA_DIR = join(PROJECT_ROOT, 'shared', 'schemas', 'api');

function loadSchemas(ajv: Ajv): void {
  for (const file of readdirSync(API_SCHEMA_DIR).filter((f) => f.endsWith('.schema.json'))) {
    ajv.addSchema(JSON.parse(readFileSync(join(API_SCHEMA_DIR, file), 'utf8')), file);
  }
}

function makeAjv(coerce: boolean): Ajv {
  // verbose: each error carries the schema it broke, so a schema's own `messages` can be read.
  const ajv = new Ajv({
    allErrors: true,
    coerceTypes: coerce,
    useDefaults: true,
    strict: false,
    verbose: true,
  });
  addFormats(ajv);
  loadSchemas(ajv);
  return ajv;
}

// Bodies are checked as sent; query strings and path parameters are text, so they are coerced.
const bodyAjv = makeAjv(false);
const textAjv = makeAjv(true);

function compiled(ajv: Ajv, name: string): ValidateFunction {
  const id = name.endsWith('.schema.json') ? name : `${name}.schema.json`;
  const validator = ajv.getSchema(id);
  if (!validator) throw new Error(`No JSON Schema ${id} in ${API_SCHEMA_DIR}`);
  return validator;
}

/**
 * A message the schema words itself: `"messages": { "<keyword>": "…" }` beside the keyword, in a
 * coach's words (ajv's own, such as "must match pattern", are for developers). The schema holds
 * them in the source language; the reader gets them in theirs (shared/i18n/schema-words.ts).
 */
function schemaMessage(error: ErrorObject): string | undefined {
  const messages = (error.parentSchema as { messages?: Record<string, unknown> } | undefined)?.messages;
  const message = messages?.[error.keyword];
  return typeof message === 'string' ? schemaWords(message) : undefined;
}

/** Turns ajv errors into one entry per field, named by its path (e.g. "players/3/id"). */
export function fieldErrors(errors: ErrorObject[] | null | undefined, prefix = ''): FieldError[] {
  const seen = new Set<string>();
  const out: FieldError[] = [];
  for (const error of errors ?? []) {
    const path = errorPath(error).join('/');
    let message = error.message ?? $localize`:field error after the field's name:is not valid`;
    if (error.keyword === 'required') message = $localize`:field error after the field's name:is required`;
    else if (error.keyword === 'additionalProperties')
      message = $localize`:field error after the field's name:is not a known field`;
    message = schemaMessage(error) ?? message;
    const field = [prefix, path].filter(Boolean).join('.') || prefix || '(body)';
    const key = `${field}|${message}`;
    if (!seen.has(key)) {
      seen.add(key);
      out.push({ field, message });
    }
  }
  return out;
}

export interface ValidationSpec {
  /** Schema names in shared/schemas/api, without ".schema.json". */
  body?: string;
  query?: string;
  params?: string;
}

/** Checks body, query and path parameters against the shared schemas; 400 naming each bad field. */
export function validate(spec: ValidationSpec): RequestHandler {
  const body = spec.body ? compiled(bodyAjv, spec.body) : null;
  const query = spec.query ? compiled(textAjv, spec.query) : null;
  const params = spec.params ? compiled(textAjv, spec.params) : null;
  return (req, _res, next) => {
    const errors: FieldError[] = [];
    if (params) {
      const copy = { ...req.params };
      if (!params(copy)) errors.push(...fieldErrors(params.errors));
      else Object.assign(req.params, copy);
    }
    if (query) {
      const copy: Record<string, unknown> = { ...(req.query as Record<string, unknown>) };
      if (!query(copy)) errors.push(...fieldErrors(query.errors));
      // Express 5's req.query is a getter; keep the coerced copy where handlers can read it.
      else Object.defineProperty(req, 'query', { value: copy, writable: true, configurable: true });
    }
    if (body) {
      if (req.body === undefined)
        errors.push({ field: '(body)', message: $localize`a JSON body is required` });
      else if (!body(req.body)) errors.push(...fieldErrors(body.errors));
    }
    if (errors.length) return next(badRequest($localize`Some fields are not valid.`, errors));
    next();
  };
}
