import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import Ajv from 'ajv';
import addFormats from 'ajv-formats';
import { PROJECT_ROOT } from '../config';
import type { FieldError } from '../http/problem';
import { fieldErrors } from '../middleware/validate';

const schemaDir = join(PROJECT_ROOT, 'shared', 'schemas');
const read = (name: string) => JSON.parse(readFileSync(join(schemaDir, name), 'utf8')) as object;

const ajv = new Ajv({ allErrors: true, strict: false });
addFormats(ajv);
ajv.addSchema(read('plan-request.schema.json'));
const validatePlan = ajv.compile(read('plan.schema.json'));

/** Structural problems in a plan sent by a client, as fields under "plan". */
export function checkPlanShape(plan: unknown): FieldError[] {
  return validatePlan(plan) ? [] : fieldErrors(validatePlan.errors, 'plan').slice(0, 20);
}
