import type { RuleSetDiffEntry } from '../../shared/types/rule-set-api';

/** Escapes a key for a JSON pointer (RFC 6901). */
function token(key: string | number): string {
  return String(key).replace(/~/g, '~0').replace(/\//g, '~1');
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Differences between two JSON documents as JSON pointers. Arrays of objects with an `id` are
 * matched by id (so a reordered rule list reads as moves of nothing); other arrays by index.
 */
export function jsonDiff(
  before: unknown,
  after: unknown,
  path = '',
  out: RuleSetDiffEntry[] = [],
): RuleSetDiffEntry[] {
  if (isObject(before) && isObject(after)) {
    for (const key of new Set([...Object.keys(before), ...Object.keys(after)])) {
      const p = `${path}/${token(key)}`;
      if (!(key in after)) out.push({ path: p, change: 'removed', before: before[key] });
      else if (!(key in before)) out.push({ path: p, change: 'added', after: after[key] });
      else jsonDiff(before[key], after[key], p, out);
    }
    return out;
  }
  if (Array.isArray(before) && Array.isArray(after)) {
    const keyed = (list: unknown[]) =>
      list.every((item) => isObject(item) && typeof item['id'] === 'string')
        ? new Map(list.map((item) => [(item as { id: string }).id, item]))
        : null;
    const a = keyed(before);
    const b = keyed(after);
    if (a && b) {
      for (const id of new Set([...a.keys(), ...b.keys()])) {
        const p = `${path}/${token(id)}`;
        if (!b.has(id)) out.push({ path: p, change: 'removed', before: a.get(id) });
        else if (!a.has(id)) out.push({ path: p, change: 'added', after: b.get(id) });
        else jsonDiff(a.get(id), b.get(id), p, out);
      }
      return out;
    }
    const length = Math.max(before.length, after.length);
    for (let i = 0; i < length; i++) {
      const p = `${path}/${i}`;
      if (i >= after.length) out.push({ path: p, change: 'removed', before: before[i] });
      else if (i >= before.length) out.push({ path: p, change: 'added', after: after[i] });
      else jsonDiff(before[i], after[i], p, out);
    }
    return out;
  }
  if (!Object.is(before, after) && JSON.stringify(before) !== JSON.stringify(after)) {
    out.push({ path: path || '/', change: 'changed', before, after });
  }
  return out;
}
