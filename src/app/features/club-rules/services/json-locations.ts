/**
 * Where each JSON pointer starts in a JSON text (1-based line and column), so a validation error
 * can be pinned to its line in the editor, and where the first syntax error is. jsonc-parser reads
 * the text and gives every node's offset; it is held to strict JSON (no comments, no trailing
 * commas), as JSON.parse is.
 */
import { parseTree, type Node, type ParseError, type ParseOptions } from 'jsonc-parser';
import { toPointer } from '../../../../../shared/json-pointer';

export interface TextLocation {
  line: number;
  column: number;
  offset: number;
}

const STRICT: ParseOptions = { disallowComments: true, allowTrailingComma: false, allowEmptyContent: false };

/** Turns offsets of one text into lines and columns. */
function locator(text: string): (offset: number) => TextLocation {
  const lineStarts = [0];
  for (let k = 0; k < text.length; k++) if (text[k] === '\n') lineStarts.push(k + 1);
  return (offset) => {
    let low = 0;
    let high = lineStarts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (lineStarts[mid] <= offset) low = mid;
      else high = mid - 1;
    }
    return { line: low + 1, column: offset - lineStarts[low] + 1, offset };
  };
}

/** Every pointer of the document: a field at its key, a list entry and the root at its value. */
export function locatePointers(text: string): Map<string, TextLocation> {
  const found = new Map<string, TextLocation>();
  const locate = locator(text);
  const walk = (node: Node, path: (string | number)[], offset: number): void => {
    found.set(toPointer(path), locate(offset));
    if (node.type === 'object') {
      for (const property of node.children ?? []) {
        const [key, value] = property.children ?? [];
        if (key && value) walk(value, [...path, String(key.value)], property.offset);
      }
    } else if (node.type === 'array') {
      (node.children ?? []).forEach((item, index) => walk(item, [...path, index], item.offset));
    }
  };
  const root = parseTree(text, [], STRICT);
  if (root) walk(root, [], root.offset);
  return found;
}

/** The location of a pointer, or of its nearest ancestor the text has (a missing field points at its parent). */
export function locatePointer(locations: Map<string, TextLocation>, pointer: string): TextLocation | null {
  let current = pointer === '/' ? '' : pointer;
  for (;;) {
    const hit = locations.get(current);
    if (hit) return hit;
    if (current === '') return null;
    current = current.slice(0, current.lastIndexOf('/'));
  }
}

/** Line and column of the first JSON syntax error (browsers do not always say where). */
export function syntaxErrorLocation(text: string, error?: unknown): TextLocation | null {
  const offset = firstSyntaxError(text) ?? positionFromMessage(error);
  return offset === null ? null : locator(text)(Math.min(offset, text.length));
}

function positionFromMessage(error: unknown): number | null {
  const position = /position (\d+)/.exec(error instanceof Error ? error.message : '');
  return position ? Number(position[1]) : null;
}

/** Offset of the first character a strict JSON reader cannot take, or null when the text is valid. */
export function firstSyntaxError(text: string): number | null {
  const errors: ParseError[] = [];
  parseTree(text, errors, STRICT);
  return errors.length ? Math.min(...errors.map((e) => e.offset)) : null;
}
