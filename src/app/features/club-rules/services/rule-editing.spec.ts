import { firstSyntaxError, locatePointer, locatePointers, syntaxErrorLocation } from './json-locations';
import { rebaseEdits } from './rebase-edits';
import { textToFormats, formatsToText } from '../rule-tables';

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

  it('holds the text to strict JSON, as JSON.parse does, and finds nothing wrong in valid text', () => {
    expect(firstSyntaxError('{"a": 1 // why\n}')).toBe(8);
    expect(firstSyntaxError('{"a": "open')).not.toBeNull();
    expect(firstSyntaxError('')).toBe(0);
    expect(firstSyntaxError(text)).toBeNull();
  });

  it('names keys with / and ~ as escaped pointers', () => {
    const at = locatePointers('{\n  "a/b": {\n    "c~d": [true]\n  }\n}');
    expect(at.get('/a~1b/c~0d')?.line).toBe(3);
    expect(at.get('/a~1b/c~0d/0')).toEqual({ line: 3, column: 13, offset: 25 });
  });
});

describe('rebaseEdits', () => {
  it("keeps both leads' changes when they touched different places", () => {
    const base = { cautions: { heatC: 27, coldC: 5 }, kinds: ['a', 'b'] };
    const theirs = { cautions: { heatC: 30, coldC: 5 }, kinds: ['a', 'b'] };
    const mine = { cautions: { heatC: 27, coldC: 2 }, kinds: ['a'] };
    const result = rebaseEdits(base, mine, theirs);
    expect(result.body).toEqual({ cautions: { heatC: 30, coldC: 2 }, kinds: ['a'] });
    expect(result.reapplied.map((c) => c.path)).toEqual(['/cautions/coldC', '/kinds']);
    expect(result.overlaps).toEqual([]);
  });

  it('re-applies an edit of a rule row to that row, wherever the other save moved it', () => {
    const base = {
      rules: [
        { id: 'heat', on: true },
        { id: 'cold', on: true },
      ],
    };
    const theirs = {
      rules: [
        { id: 'new', on: true },
        { id: 'cold', on: true },
        { id: 'heat', on: true },
      ],
    };
    const mine = {
      rules: [
        { id: 'heat', on: false },
        { id: 'cold', on: true },
      ],
    };
    const result = rebaseEdits(base, mine, theirs);
    expect(result.body).toEqual({
      rules: [
        { id: 'new', on: true },
        { id: 'cold', on: true },
        { id: 'heat', on: false },
      ],
    });
    expect(result.reapplied.map((c) => c.path)).toEqual(['/rules/heat/on']);
    expect(result.overlaps).toEqual([]);
  });

  it('reports the places both changed, keeping mine', () => {
    const result = rebaseEdits({ heatC: 27 }, { heatC: 25 }, { heatC: 30 });
    expect(result.body).toEqual({ heatC: 25 });
    expect(result.overlaps).toEqual([{ pointer: '/heatC', theirs: 30, mine: 25 }]);
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
