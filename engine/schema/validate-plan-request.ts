/** Checks a PlanRequest against its JSON Schema and names each bad field (e.g. `players/3/id`). */
import type { ErrorObject, ValidateFunction } from 'ajv';
// Precompiled from shared/schemas/plan-request.schema.json: no eval, so it runs under the app's CSP.
import { errorPath } from '../../shared/schemas/error-path';
import generated from './generated/plan-request.validator';

export interface FieldError {
  field: string;
  message: string;
}

export interface RequestValidation {
  ok: boolean;
  errors: FieldError[];
}

const compiled = () => generated as unknown as ValidateFunction;

export function validatePlanRequest(value: unknown): RequestValidation {
  const validate = compiled();
  const errors: FieldError[] = [];
  if (!validate(value)) {
    for (const e of validate.errors ?? []) errors.push(describe(e));
  }
  errors.push(...duplicatePlayers(value));
  const unique = dedupe(errors);
  return { ok: unique.length === 0, errors: unique };
}

function duplicatePlayers(value: unknown): FieldError[] {
  const players = (value as { players?: unknown })?.players;
  if (!Array.isArray(players)) return [];
  const seen = new Map<string, number>();
  const out: FieldError[] = [];
  players.forEach((p: { id?: unknown } | null, i) => {
    if (typeof p?.id !== 'string') return;
    const first = seen.get(p.id);
    if (first !== undefined)
      out.push({ field: `players/${i}/id`, message: `duplicates players/${first}/id` });
    else seen.set(p.id, i);
  });
  return out;
}

/** The field as "players/3/id"; an empty key still needs a visible name. */
function fieldOf(e: ErrorObject): string {
  const parts = errorPath(e);
  return parts.length ? parts.map((p) => (p === '' ? '""' : p)).join('/') : '(request)';
}

function describe(e: ErrorObject): FieldError {
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'required':
      return { field: fieldOf(e), message: 'is required' };
    case 'additionalProperties':
      return {
        field: fieldOf(e),
        message: 'is not a known field',
      };
    case 'enum':
      return {
        field: fieldOf(e),
        message: `must be one of ${(p['allowedValues'] as unknown[]).join(', ')}`,
      };
    case 'type':
      return { field: fieldOf(e), message: `must be ${withArticle(String(p['type']))}` };
    default:
      return { field: fieldOf(e), message: e.message ?? 'is invalid' };
  }
}

function withArticle(type: string): string {
  return /^[aeiou]/.test(type) ? `an ${type}` : `a ${type}`;
}

function dedupe(errors: FieldError[]): FieldError[] {
  const seen = new Set<string>();
  return errors.filter((e) => {
    const key = `${e.field}\u0000${e.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
