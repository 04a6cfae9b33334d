import { diffJson } from './json-diff';
import { locatePointer, locatePointers, syntaxErrorLocation } from './json-locations';
import { getAt, setAt } from './json-pointer';
import { rebaseEdits } from './rebase-edits';
import { textToFormats, formatsToText } from '../rule-tables';

describe('JSON pointers', () => {
  it('writes a copy and leaves the original alone', () => {
    const original = { a: { b: [1, { c: 2 }] }, 'x/y': 1 };
    const next = setAt(original, '/a/b/1/c', 5);
    expect(getAt(next, '/a/b/1/c')).toBe(5);
    expect(getAt(original, '/a/b/1/c')).toBe(2);
    expect(getAt(setAt(original, '/x~1y', 2), '/x~1y')).toBe(2);
    expect(getAt(setAt(original, '/a/b', undefined), '/a')).toEqual({});
  });
});

describe('locatePointers', () => {
  const text = JSON.stringify(
    { parameters: { keepBall: { beginner: { max: 4, formats: [{ a: 4 }, { a: 5 }] } } } },
    null,
    2,
  );

  it('finds the line of every value, and of the parent when a field is missing', () => {
    const lines = text.split('\n');
    const at = locatePointers(text);
    const max = at.get('/parameters/keepBall/beginner/max')!;
    expect(lines[max.line - 1]).toContain('"max": 4');
    const second = at.get('/parameters/keepBall/beginner/formats/1')!;
    expect(lines[second.line - 1].trim()).toBe('{');
    expect(lines[second.line]).toContain('"a": 5');
    const missing = locatePointer(at, '/parameters/keepBall/beginner/minimum');
    expect(lines[missing!.line - 1]).toContain('"beginner"');
  });

  it('places a syntax error on its line', () => {
    const broken = '{\n  "a": 1,\n  "b": ,\n}';
    let error: unknown;
    try {
      JSON.parse(broken);
    } catch (e) {
      error = e;
    }
    expect(syntaxErrorLocation(broken, error)).toEqual({ line: 3, column: 8, offset: 19 });
    expect(syntaxErrorLocation('{"a": [1, 2,]}')?.column).toBe(13);
    expect(syntaxErrorLocation('{"a": 1} x')?.column).toBe(10);
  });
});

describe('rebaseEdits', () => {
  it("keeps both leads' changes when they touched different places", () => {
    const base = { cautions: { heatC: 27, coldC: 5 }, kinds: ['a', 'b'] };
    const theirs = { cautions: { heatC: 30, coldC: 5 }, kinds: ['a', 'b'] };
    const mine = { cautions: { heatC: 27, coldC: 2 }, kinds: ['a'] };
    const result = rebaseEdits(base, mine, theirs);
    expect(result.body).toEqual({ cautions: { heatC: 30, coldC: 2 }, kinds: ['a'] });
    expect(result.reapplied.map((c) => c.pointer)).toEqual(['/cautions/coldC', '/kinds']);
    expect(result.overlaps).toEqual([]);
  });

  it('reports the places both changed, keeping mine', () => {
    const result = rebaseEdits({ heatC: 27 }, { heatC: 25 }, { heatC: 30 });
    expect(result.body).toEqual({ heatC: 25 });
    expect(result.overlaps).toEqual([{ pointer: '/heatC', theirs: 30, mine: 25 }]);
  });
});

describe('diffJson', () => {
  it('lists the deepest places that changed, arrays as one change unless objects of the same length', () => {
    const changes = diffJson(
      { a: { b: 1, c: [1, 2] }, list: [{ x: 1 }, { x: 2 }], short: [{ y: 1 }, { y: 2 }], gone: true },
      { a: { b: 2, c: [1, 2, 3] }, list: [{ x: 1 }, { x: 3 }], short: [{ y: 1 }], added: 1 },
    );
    expect(changes).toEqual([
      { pointer: '/a/b', kind: 'changed', before: 1, after: 2 },
      { pointer: '/a/c', kind: 'changed', before: [1, 2], after: [1, 2, 3] },
      { pointer: '/list/1/x', kind: 'changed', before: 2, after: 3 },
      { pointer: '/short', kind: 'changed', before: [{ y: 1 }, { y: 2 }], after: [{ y: 1 }] },
      { pointer: '/gone', kind: 'removed', before: true },
      { pointer: '/added', kind: 'added', after: 1 },
    ]);
  });
});

describe('keep-ball format text', () => {
  it('reads and writes "4v1, 3v1"', () => {
    expect(textToFormats('4v1, 3V1 5v2')).toEqual([
      { attackers: 4, defenders: 1 },
      { attackers: 3, defenders: 1 },
      { attackers: 5, defenders: 2 },
    ]);
    expect(textToFormats('four v one')).toBeNull();
    expect(textToFormats('')).toBeNull();
    expect(formatsToText([{ attackers: 4, defenders: 1 }])).toBe('4v1');
  });
});
