import { toPointer } from '../../shared/json-pointer';
import type { RuleSetDiffEntry } from '../../shared/types/rule-set-api';

/** One difference between two JSON documents, at the deepest place that differs. */
export type JsonChange = RuleSetDiffEntry;

/**
 * How lists without ids are compared. `items`: place by place, so the history says which entry
 * changed ("Formats › Format 2: removed"). `values`: as one value, as a person edits them in one
 * cell ("Formats: 4v1, 3v1 → 3v1"), except lists of objects that keep their length, which are still
 * compared place by place so one edited field reads as that field.
 */
export type ListComparison = 'items' | 'values';

const isObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** A list's rows by id when every row is an object with a string id; else null. */
function rowsById(list: unknown[]): Map<string, unknown> | null {
  return list.every((item) => isObject(item) && typeof item['id'] === 'string')
    ? new Map(list.map((item) => [(item as { id: string }).id, item]))
    : null;
}

/**
 * What changed from `before` to `after`, each as a JSON pointer and the values there. Lists of
 * objects with ids (rules, activities) are matched by id, so a reordered list is no change and a
 * pointer names the row by its id; other lists as `lists` says.
 */
export function jsonDiff(before: unknown, after: unknown, lists: ListComparison = 'items'): JsonChange[] {
  const out: JsonChange[] = [];
  const walk = (a: unknown, b: unknown, path: (string | number)[]): void => {
    if (Object.is(a, b)) return;
    const at = (key: string | number) => [...path, key];
    if (isObject(a) && isObject(b)) {
      for (const key of new Set([...Object.keys(a), ...Object.keys(b)])) {
        if (!(key in b)) out.push({ path: toPointer(at(key)), change: 'removed', before: a[key] });
        else if (!(key in a)) out.push({ path: toPointer(at(key)), change: 'added', after: b[key] });
        else walk(a[key], b[key], at(key));
      }
      return;
    }
    if (Array.isArray(a) && Array.isArray(b)) {
      const rowsA = rowsById(a);
      const rowsB = rowsById(b);
      if (rowsA && rowsB && (rowsA.size || rowsB.size)) {
        for (const id of new Set([...rowsA.keys(), ...rowsB.keys()])) {
          if (!rowsB.has(id)) out.push({ path: toPointer(at(id)), change: 'removed', before: rowsA.get(id) });
          else if (!rowsA.has(id))
            out.push({ path: toPointer(at(id)), change: 'added', after: rowsB.get(id) });
          else walk(rowsA.get(id), rowsB.get(id), at(id));
        }
        return;
      }
      const placeByPlace =
        lists === 'items' || (a.length === b.length && a.some(isObject) && b.some(isObject));
      if (placeByPlace) {
        for (let i = 0; i < Math.max(a.length, b.length); i++) {
          if (i >= b.length) out.push({ path: toPointer(at(i)), change: 'removed', before: a[i] });
          else if (i >= a.length) out.push({ path: toPointer(at(i)), change: 'added', after: b[i] });
          else walk(a[i], b[i], at(i));
        }
        return;
      }
    }
    if (JSON.stringify(a) !== JSON.stringify(b))
      out.push({ path: toPointer(path), change: 'changed', before: a, after: b });
  };
  walk(before, after, []);
  return out;
}

/**
 * The differences between two versions of a rule set: as `jsonDiff`, without the document's own
 * id and version, which always differ between versions and are no change of the rules.
 */
export function ruleSetChanges(
  before: unknown,
  after: unknown,
  lists: ListComparison = 'items',
): JsonChange[] {
  return jsonDiff(before, after, lists).filter((c) => c.path !== '/id' && c.path !== '/version');
}
