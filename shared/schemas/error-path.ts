import type { ErrorObject } from 'ajv';

/**
 * The field an ajv error is about, as its property names and array indexes: ["players", "3",
 * "id"]. For `required` and `additionalProperties` it is the missing or unknown property itself,
 * not the object holding it. The one reading of an error's place, shared by the server's 400s
 * and the engine's request check (which join it with "/") and the client's forms (which join it
 * with ".", as Angular names nested controls).
 */
export function errorPath(error: ErrorObject): string[] {
  const parts = error.instancePath
    .split('/')
    .slice(1)
    .map((part) => part.replace(/~1/g, '/').replace(/~0/g, '~'));
  const params = error.params as { missingProperty?: string; additionalProperty?: string };
  if (error.keyword === 'required' && params.missingProperty !== undefined)
    parts.push(params.missingProperty);
  if (error.keyword === 'additionalProperties' && params.additionalProperty !== undefined)
    parts.push(params.additionalProperty);
  return parts;
}
