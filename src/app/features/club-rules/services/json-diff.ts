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
 * Lists what changed from `before` to `after`. Arrays of plain values (allowed kinds, say) are
 * compared whole, so the change reads as one line; arrays of objects are compared item by item.
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
  if (Array.isArray(before) && Array.isArray(after) && before.some(isObject) && after.some(isObject)) {
    const changes: JsonChange[] = [];
    const length = Math.max(before.length, after.length);
    for (let i = 0; i < length; i++) {
      if (i >= after.length)
        changes.push({ pointer: toPointer([...path, i]), kind: 'removed', before: before[i] });
      else if (i >= before.length)
        changes.push({ pointer: toPointer([...path, i]), kind: 'added', after: after[i] });
      else changes.push(...diffJson(before[i], after[i], [...path, i]));
    }
    return changes;
  }
  if (JSON.stringify(before) === JSON.stringify(after)) return [];
  return [{ pointer: toPointer(path), kind: 'changed', before, after }];
}

/** A short, readable rendering of a JSON value for diff rows. */
export function showValue(value: unknown): string {
  if (value === undefined) return '—';
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 77)}…` : text;
}
