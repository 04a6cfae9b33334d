/**
 * Where each JSON pointer starts in a JSON text (1-based line and column), so a validation error
 * can be pinned to its line in the editor. A small scanner: it assumes the text already parsed.
 */
export interface TextLocation {
  line: number;
  column: number;
  offset: number;
}

export function locatePointers(text: string): Map<string, TextLocation> {
  const found = new Map<string, TextLocation>();
  let i = 0;
  const lineStarts = [0];
  for (let k = 0; k < text.length; k++) if (text[k] === '\n') lineStarts.push(k + 1);
  const locate = (offset: number): TextLocation => {
    let low = 0;
    let high = lineStarts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (lineStarts[mid] <= offset) low = mid;
      else high = mid - 1;
    }
    return { line: low + 1, column: offset - lineStarts[low] + 1, offset };
  };
  const skip = () => {
    while (i < text.length && /\s/.test(text[i])) i++;
  };
  const readString = (): string => {
    const start = i;
    i++;
    while (i < text.length && text[i] !== '"') i += text[i] === '\\' ? 2 : 1;
    i++;
    return JSON.parse(text.slice(start, i)) as string;
  };
  const escape = (t: string) => t.replace(/~/g, '~0').replace(/\//g, '~1');
  const value = (pointer: string, keyOffset: number) => {
    skip();
    found.set(pointer, locate(keyOffset >= 0 ? keyOffset : i));
    const c = text[i];
    if (c === '{') {
      i++;
      skip();
      while (i < text.length && text[i] !== '}') {
        const keyAt = i;
        const key = readString();
        skip();
        i++; // colon
        value(`${pointer}/${escape(key)}`, keyAt);
        skip();
        if (text[i] === ',') i++;
        skip();
      }
      i++;
    } else if (c === '[') {
      i++;
      skip();
      let index = 0;
      while (i < text.length && text[i] !== ']') {
        value(`${pointer}/${index++}`, -1);
        skip();
        if (text[i] === ',') i++;
        skip();
      }
      i++;
    } else if (c === '"') {
      readString();
    } else {
      while (i < text.length && !/[\s,\]}]/.test(text[i])) i++;
    }
  };
  value('', -1);
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
  if (offset === null) return null;
  const before = text.slice(0, offset).split('\n');
  return { line: before.length, column: before.at(-1)!.length + 1, offset };
}

function positionFromMessage(error: unknown): number | null {
  const position = /position (\d+)/.exec(error instanceof Error ? error.message : '');
  return position ? Number(position[1]) : null;
}

/** Offset of the first character a strict JSON reader cannot take, or null when the text is valid. */
export function firstSyntaxError(text: string): number | null {
  let i = 0;
  class Stop {
    constructor(readonly at: number) {}
  }
  const fail = (): never => {
    throw new Stop(i);
  };
  const skip = () => {
    while (i < text.length && /[ \t\n\r]/.test(text[i])) i++;
  };
  const literal = (word: string) => {
    if (text.startsWith(word, i)) i += word.length;
    else fail();
  };
  const string = () => {
    i++;
    while (i < text.length && text[i] !== '"') {
      if (text[i] === '\\') {
        i++;
        if (!/["\\/bfnrtu]/.test(text[i] ?? '')) fail();
      } else if (text.charCodeAt(i) < 0x20) fail();
      i++;
    }
    if (text[i] !== '"') fail();
    i++;
  };
  const number = () => {
    const match = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i));
    if (!match) fail();
    i += match![0].length;
  };
  const value = (): void => {
    skip();
    const c = text[i];
    if (c === '{') {
      i++;
      skip();
      if (text[i] === '}') {
        i++;
        return;
      }
      for (;;) {
        skip();
        if (text[i] !== '"') fail();
        string();
        skip();
        if (text[i] !== ':') fail();
        i++;
        value();
        skip();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === '}') {
          i++;
          return;
        }
        fail();
      }
    }
    if (c === '[') {
      i++;
      skip();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value();
        skip();
        if (text[i] === ',') {
          i++;
          continue;
        }
        if (text[i] === ']') {
          i++;
          return;
        }
        fail();
      }
    }
    if (c === '"') return string();
    if (c === 't') return literal('true');
    if (c === 'f') return literal('false');
    if (c === 'n') return literal('null');
    return number();
  };
  try {
    value();
    skip();
    return i < text.length ? i : null;
  } catch (stop) {
    if (stop instanceof Stop) return Math.min(stop.at, text.length);
    throw stop;
  }
}
