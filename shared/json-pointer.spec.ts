import { describe, expect, it } from 'vitest';
import { getAt, pointerTokens, setAt, toPointer } from './json-pointer';

describe('JSON pointers', () => {
  it('writes a copy and leaves the original alone', () => {
    const original = { a: { b: [1, { c: 2 }] }, 'x/y': 1 };
    const next = setAt(original, '/a/b/1/c', 5);
    expect(getAt(next, '/a/b/1/c')).toBe(5);
    expect(getAt(original, '/a/b/1/c')).toBe(2);
    expect(getAt(setAt(original, '/x~1y', 2), '/x~1y')).toBe(2);
    expect(getAt(setAt(original, '/a/b', undefined), '/a')).toEqual({});
  });

  it('escapes and reads back keys with / and ~', () => {
    expect(toPointer(['a/b', 'c~d', 3])).toBe('/a~1b/c~0d/3');
    expect(pointerTokens('/a~1b/c~0d/3')).toEqual(['a/b', 'c~d', '3']);
    expect(pointerTokens('')).toEqual([]);
  });

  it('names a row of a list by its id: read, replace in place, remove, add at the end', () => {
    const doc = {
      rules: [
        { id: 'r1', on: true },
        { id: 'r2', on: false },
      ],
    };
    expect(getAt(doc, '/rules/r2/on')).toBe(false);
    expect(getAt(doc, '/rules/r3')).toBeUndefined();
    expect(setAt(doc, '/rules/r2/on', true).rules).toEqual([
      { id: 'r1', on: true },
      { id: 'r2', on: true },
    ]);
    expect(setAt(doc, '/rules/r1', undefined).rules).toEqual([{ id: 'r2', on: false }]);
    expect(setAt(doc, '/rules/r3', { id: 'r3', on: true }).rules.map((r) => r.id)).toEqual([
      'r1',
      'r2',
      'r3',
    ]);
    expect(doc.rules).toHaveLength(2);
  });
});
