import { toPointer } from './json-pointer';

/** One difference between two JSON documents, at the deepest place that differs. */
export interface JsonChange {
  pointer: string;
  kind: 'added' | 'removed' | 'changed';
  before?: unknown;
  after?: unknown;
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  v !== null && typeof v === 'object' && !Array.isArray(v);

/**
 * Lists what changed from `before` to `after`. Arrays are compared whole (one line: "formats
 * 4v1, 3v1 → 3v1"), except arrays of objects of the same length, which are compared item by item
 * so one edited field of one rule reads as that field.
 */
export function diffJson(before: unknown, after: unknown, path: (string | number)[] = []): JsonChange[] {
  if (Object.is(before, after)) return [];
  if (isObject(before) && isObject(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])];
    return keys.flatMap((key) => {
      if (!(key in after))
        return [{ pointer: toPointer([...path, key]), kind: 'removed' as const, before: before[key] }];
      if (!(key in before))
        return [{ pointer: toPointer([...path, key]), kind: 'added' as const, after: after[key] }];
      return diffJson(before[key], after[key], [...path, key]);
    });
  }
  if (
    Array.isArray(before) &&
    Array.isArray(after) &&
    before.length === after.length &&
    before.some(isObject) &&
    after.some(isObject)
  ) {
    return before.flatMap((item, i) => diffJson(item, after[i], [...path, i]));
  }
  if (JSON.stringify(before) === JSON.stringify(after)) return [];
  return [{ pointer: toPointer(path), kind: 'changed', before, after }];
}

/** A short, readable rendering of a JSON value for diff rows. */
export function showValue(value: unknown): string {
  if (value === undefined) return '—';
  if (
    Array.isArray(value) &&
    value.length &&
    value.every((v) => v && typeof v === 'object' && 'attackers' in v && 'defenders' in v)
  ) {
    return value
      .map((v: { attackers: number; defenders: number }) => `${v.attackers}v${v.defenders}`)
      .join(', ');
  }
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 77)}…` : text;
}
