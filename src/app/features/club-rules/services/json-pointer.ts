/** RFC 6901 JSON pointers: read, write (copying along the way) and escape. */

export function escapeToken(token: string): string {
  return token.replace(/~/g, '~0').replace(/\//g, '~1');
}

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

export function getAt(root: unknown, pointer: string): unknown {
  let node: unknown = root;
  for (const token of pointerTokens(pointer)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[token];
  }
  return node;
}

/** A copy of root with the value at pointer replaced (undefined removes it); untouched branches are shared. */
export function setAt<T>(root: T, pointer: string, value: unknown): T {
  const tokens = pointerTokens(pointer);
  if (tokens.length === 0) return value as T;
  const write = (node: unknown, depth: number): unknown => {
    const token = tokens[depth];
    const container: Record<string, unknown> | unknown[] = Array.isArray(node)
      ? [...node]
      : node && typeof node === 'object'
        ? { ...(node as Record<string, unknown>) }
        : /^\d+$/.test(token)
          ? []
          : {};
    const record = container as Record<string, unknown>;
    if (depth === tokens.length - 1) {
      if (value === undefined && !Array.isArray(container)) delete record[token];
      else record[token] = value;
    } else {
      record[token] = write(record[token], depth + 1);
    }
    return container;
  };
  return write(root, 0) as T;
}
