import { ValidatorFn, Validators } from '@angular/forms';
import type { NumberLimits } from '../../../../shared/units';

/** The numeric keywords of one property of a JSON Schema. */
interface NumberSchema {
  type?: string;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
}

/** The property a JSON pointer names ("/properties/space/properties/width"), or null. */
export function schemaAt(schema: object, pointer: string): NumberSchema | null {
  let node: unknown = schema;
  for (const part of pointer.split('/').filter(Boolean)) {
    if (!node || typeof node !== 'object') return null;
    node = (node as Record<string, unknown>)[part.replace(/~1/g, '/').replace(/~0/g, '~')];
  }
  return node && typeof node === 'object' ? (node as NumberSchema) : null;
}

/**
 * Angular validators for a number field from the server's own schema, so a form's limits are
 * the API's limits and never a copy: minimum/maximum (errors `min`/`max`), exclusive bounds
 * (`above`/`below`) and whole numbers (`wholeNumber`). Messages: `controlMessage`.
 */
export function schemaNumberValidators(
  schema: object,
  pointer: string,
  /** The limits in the unit the field is typed in (shared/units), when it is not the schema's. */
  inUnit?: (limits: NumberLimits) => NumberLimits,
): ValidatorFn[] {
  const found = schemaAt(schema, pointer);
  if (!found) throw new Error(`No property ${pointer} in the schema`);
  const at: NumberSchema = inUnit ? { type: found.type, ...inUnit(found) } : found;
  const validators: ValidatorFn[] = [];
  if (at.minimum !== undefined) validators.push(Validators.min(at.minimum));
  if (at.maximum !== undefined) validators.push(Validators.max(at.maximum));
  const number = (value: unknown): value is number => typeof value === 'number' && !Number.isNaN(value);
  if (at.exclusiveMinimum !== undefined) {
    const above = at.exclusiveMinimum;
    validators.push((c) => (number(c.value) && c.value <= above ? { above: { above } } : null));
  }
  if (at.exclusiveMaximum !== undefined) {
    const below = at.exclusiveMaximum;
    validators.push((c) => (number(c.value) && c.value >= below ? { below: { below } } : null));
  }
  if (at.type === 'integer') {
    validators.push((c) => (number(c.value) && !Number.isInteger(c.value) ? { wholeNumber: true } : null));
  }
  return validators;
}
