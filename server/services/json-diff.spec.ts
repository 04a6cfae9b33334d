import { describe, expect, it } from 'vitest';
import { jsonDiff } from './json-diff';

describe('jsonDiff', () => {
  it('names changed, added and removed values by JSON pointer', () => {
    const before = { a: { b: 1, 'x/y': true }, list: [1, 2, 3], gone: 'yes' };
    const after = { a: { b: 2, 'x/y': true }, list: [1, 2], added: null };
    expect(jsonDiff(before, after)).toEqual([
      { path: '/a/b', change: 'changed', before: 1, after: 2 },
      { path: '/list/2', change: 'removed', before: 3 },
      { path: '/gone', change: 'removed', before: 'yes' },
      { path: '/added', change: 'added', after: null },
    ]);
  });

  it('matches lists of objects with ids by id, so reordering is no change', () => {
    const rules = [
      { id: 'r1', on: true },
      { id: 'r2', on: false },
    ];
    expect(jsonDiff({ rules }, { rules: [rules[1], rules[0]] })).toEqual([]);
    expect(jsonDiff({ rules }, { rules: [{ id: 'r2', on: true }] })).toEqual([
      { path: '/rules/r1', change: 'removed', before: rules[0] },
      { path: '/rules/r2/on', change: 'changed', before: false, after: true },
    ]);
  });

  it('finds nothing between equal documents', () => {
    expect(jsonDiff({ a: [1, { b: 'c' }] }, { a: [1, { b: 'c' }] })).toEqual([]);
  });
});
