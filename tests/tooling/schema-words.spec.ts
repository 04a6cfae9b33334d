/**
 * Every word the request schemas give a person (a keyword's "messages", and the description of a
 * pattern a person can break while filling a form) is in shared/i18n/schema-words.ts, so it is
 * translated with the rest; the schemas' other descriptions are notes for developers.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { SCHEMA_WORDS, schemaWords } from '../../shared/i18n/schema-words';

const SCHEMAS = fileURLToPath(new URL('../../shared/schemas/', import.meta.url));

/** Descriptions a person reads beside a field whose pattern they broke (forms that have it). */
const PATTERNS_PEOPLE_TYPE = ['personName', 'displayName', 'startTime', 'kickOff', 'anyOf'];

function schemaFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory()
      ? schemaFiles(join(dir, entry.name))
      : entry.name.endsWith('.json')
        ? [join(dir, entry.name)]
        : [],
  );
}

function wordsIn(
  node: unknown,
  key = '',
  found = { messages: new Set<string>(), patterns: new Set<string>() },
) {
  if (Array.isArray(node)) node.forEach((item) => wordsIn(item, key, found));
  else if (node && typeof node === 'object') {
    const schema = node as Record<string, unknown>;
    if (schema['messages'] && typeof schema['messages'] === 'object')
      Object.values(schema['messages'] as Record<string, string>).forEach((m) => found.messages.add(m));
    if (
      typeof schema['pattern'] === 'string' &&
      typeof schema['description'] === 'string' &&
      PATTERNS_PEOPLE_TYPE.includes(key)
    )
      found.patterns.add(schema['description']);
    for (const [k, v] of Object.entries(schema)) wordsIn(v, k, found);
  }
  return found;
}

describe('the request schemas’ words', () => {
  const found = schemaFiles(SCHEMAS).reduce(
    (all, file) => wordsIn(JSON.parse(readFileSync(file, 'utf8')), '', all),
    { messages: new Set<string>(), patterns: new Set<string>() },
  );

  it('are all translatable', () => {
    expect(found.messages.size).toBeGreaterThan(30);
    expect(found.patterns.size).toBe(4);
    expect([...found.messages, ...found.patterns].filter((w) => !SCHEMA_WORDS.includes(w))).toEqual([]);
  });

  it('come back as written in the source language, and pass unknown words through', () => {
    for (const words of SCHEMA_WORDS) expect(schemaWords(words)).toBe(words);
    expect(schemaWords('a word no schema has')).toBe('a word no schema has');
  });
});
