/**
 * RFC 6901 JSON pointers into rule sets: read, write (copying along the way) and escape. In a list
 * whose rows carry an `id` (rules, activities) a key that is not a number names the row with that
 * id, so a pointer such as "/rules/heat.drinks/description" stays on its row when the list is
 * reordered; `jsonDiff` (engine/) writes such pointers.
 */

export function escapeToken(token: string): string {
  return token.replace(/~/g, '~0').replace(/\//g, '~1');
}

/** The keys of a pointer; "" and "/" both mean the whole document. */
export function pointerTokens(pointer: string): string[] {
  if (pointer === '' || pointer === '/') return [];
  return pointer
    .replace(/^\//, '')
    .split('/')
    .map((t) => t.replace(/~1/g, '/').replace(/~0/g, '~'));
}

export function toPointer(tokens: readonly (string | number)[]): string {
  return tokens.length ? '/' + tokens.map((t) => escapeToken(String(t))).join('/') : '';
}

const isIndex = (token: string) => /^\d+$/.test(token);

/** Where `token` is in a list: its index, or the index of the row whose id it is (-1: none). */
function indexIn(list: readonly unknown[], token: string): number {
  if (isIndex(token)) return Number(token);
  return list.findIndex(
    (item) => !!item && typeof item === 'object' && (item as { id?: unknown }).id === token,
  );
}

/** The value under one key of a list or object; in a list of rows with ids, the row with that id. */
export function childAt(node: unknown, token: string): unknown {
  if (Array.isArray(node)) return node[indexIn(node, token)];
  return node && typeof node === 'object' ? (node as Record<string, unknown>)[token] : undefined;
}

export function getAt(root: unknown, pointer: string): unknown {
  let node: unknown = root;
  for (const token of pointerTokens(pointer)) node = childAt(node, token);
  return node;
}

/**
 * A copy of root with the value at pointer replaced (undefined removes it); untouched branches are
 * shared. A row named by id is replaced where it stands, removed, or added at the end of its list.
 */
export function setAt<T>(root: T, pointer: string, value: unknown): T {
  const tokens = pointerTokens(pointer);
  if (tokens.length === 0) return value as T;
  const write = (node: unknown, depth: number): unknown => {
    const token = tokens[depth];
    const last = depth === tokens.length - 1;
    if (Array.isArray(node) && !isIndex(token)) {
      const list = [...node];
      const at = indexIn(list, token);
      const next = last ? value : write(at < 0 ? undefined : list[at], depth + 1);
      if (at < 0) {
        if (next !== undefined) list.push(next);
      } else if (next === undefined) list.splice(at, 1);
      else list[at] = next;
      return list;
    }
    const container: Record<string, unknown> | unknown[] = Array.isArray(node)
      ? [...node]
      : node && typeof node === 'object'
        ? { ...(node as Record<string, unknown>) }
        : isIndex(token)
          ? []
          : {};
    const record = container as Record<string, unknown>;
    if (last) {
      if (value === undefined && !Array.isArray(container)) delete record[token];
      else record[token] = value;
    } else {
      record[token] = write(record[token], depth + 1);
    }
    return container;
  };
  return write(root, 0) as T;
}
