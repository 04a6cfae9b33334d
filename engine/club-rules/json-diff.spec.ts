import { describe, expect, it } from 'vitest';
import { rulePathWords } from '../../shared/types/rule-words';
import { defaultRuleSet } from '../rule-sets';
import { jsonDiff, ruleSetChanges } from './json-diff';

describe('jsonDiff', () => {
  it('names changed, added and removed values by JSON pointer, lists place by place', () => {
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
    expect(jsonDiff({ rules: [] }, { rules: [{ id: 'a/b', on: true }] })).toEqual([
      { path: '/rules/a~1b', change: 'added', after: { id: 'a/b', on: true } },
    ]);
  });

  it('with lists as values, compares a list as one value unless it holds objects and keeps its length', () => {
    const changes = jsonDiff(
      { a: { b: 1, c: [1, 2] }, list: [{ x: 1 }, { x: 2 }], short: [{ y: 1 }, { y: 2 }], gone: true },
      { a: { b: 2, c: [1, 2, 3] }, list: [{ x: 1 }, { x: 3 }], short: [{ y: 1 }], added: 1 },
      'values',
    );
    expect(changes).toEqual([
      { path: '/a/b', change: 'changed', before: 1, after: 2 },
      { path: '/a/c', change: 'changed', before: [1, 2], after: [1, 2, 3] },
      { path: '/list/1/x', change: 'changed', before: 2, after: 3 },
      { path: '/short', change: 'changed', before: [{ y: 1 }, { y: 2 }], after: [{ y: 1 }] },
      { path: '/gone', change: 'removed', before: true },
      { path: '/added', change: 'added', after: 1 },
    ]);
  });

  it('finds nothing between equal documents', () => {
    expect(jsonDiff({ a: [1, { b: 'c' }] }, { a: [1, { b: 'c' }] })).toEqual([]);
    expect(jsonDiff(defaultRuleSet, structuredClone(defaultRuleSet), 'values')).toEqual([]);
  });
});

describe('ruleSetChanges', () => {
  const edited = () => {
    const next = structuredClone(defaultRuleSet);
    next.id = 'club-draft';
    next.version = 4;
    next.parameters.groupSizes['keep-ball']!.beginner!.max = 5;
    next.rules = [...next.rules].reverse();
    next.rules[0] = { ...next.rules[0]!, description: 'Shorter drinks breaks in the cold' };
    return next;
  };

  it('leaves out the id and version and reads as the history says it', () => {
    const before = defaultRuleSet.parameters.groupSizes['keep-ball']!.beginner!.max;
    const changes = ruleSetChanges(defaultRuleSet, edited());
    expect(changes).toEqual([
      {
        path: '/parameters/groupSizes/keep-ball/beginner/max',
        change: 'changed',
        before,
        after: 5,
      },
      {
        path: `/rules/${edited().rules[0]!.id}/description`,
        change: 'changed',
        before: defaultRuleSet.rules.at(-1)!.description,
        after: 'Shorter drinks breaks in the cold',
      },
    ]);
    expect(rulePathWords(changes[0]!.path, edited())).toBe('Group sizes › Keep-ball › Beginner › Most');
    expect(rulePathWords(changes[1]!.path, edited())).toBe(
      'Rules › Shorter drinks breaks in the cold › Description',
    );
  });
});
