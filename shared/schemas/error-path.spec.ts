import { Ajv } from 'ajv';
import { describe, expect, it } from 'vitest';
import { errorPath } from './error-path';

const schema = {
  type: 'object',
  additionalProperties: false,
  required: ['space'],
  properties: {
    space: { type: 'object', required: ['width'], properties: { width: { type: 'number', minimum: 5 } } },
    players: { type: 'array', items: { type: 'object', properties: { id: { type: 'string' } } } },
    'a/b': { type: 'number' },
  },
};

describe('errorPath', () => {
  const validate = new Ajv({ allErrors: true }).compile(schema);
  const paths = (value: unknown) => {
    validate(value);
    return (validate.errors ?? []).map(errorPath);
  };

  it('names the missing or unknown property itself, not its parent', () => {
    expect(paths({ space: {}, extra: 1 })).toEqual(expect.arrayContaining([['space', 'width'], ['extra']]));
    expect(paths({})).toEqual([['space']]);
  });

  it('walks into arrays by index and unescapes JSON-pointer parts', () => {
    expect(paths({ space: { width: 2 }, players: [{ id: 'x' }, { id: 7 }], 'a/b': 'no' })).toEqual(
      expect.arrayContaining([['space', 'width'], ['players', '1', 'id'], ['a/b']]),
    );
  });
});
