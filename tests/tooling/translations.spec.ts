/**
 * The Spanish translation is complete and keeps every placeholder: each message extracted from
 * the app (src/locale/messages.xlf, written by `ng extract-i18n`) and from what only the server
 * says (server/locale/messages.xlf, written by server/cli/extract-words.ts) has a Spanish target
 * in messages.es.xlf beside it that holds the same placeholders (a name, a number, the start and
 * end of a tag) and, for plurals and choices, the same cases. The Spanish build refuses a message
 * without a translation (angular.json: i18nMissingTranslation "error"); the server would say it
 * in English; this says which one, and why.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { LANGUAGES } from '../../shared/i18n/languages';

interface Unit {
  id: string;
  source: string;
  target: string | null;
}

function unitsOf(file: string): Map<string, Unit> {
  const xml = readFileSync(new URL(`../../${file}`, import.meta.url), 'utf8');
  const units = new Map<string, Unit>();
  for (const [, id, body] of xml.matchAll(/<trans-unit id="([^"]+)"[^>]*>([\s\S]*?)<\/trans-unit>/g)) {
    units.set(id!, {
      id: id!,
      source: /<source>([\s\S]*?)<\/source>/.exec(body!)?.[1] ?? '',
      target: /<target[^>]*>([\s\S]*?)<\/target>/.exec(body!)?.[1] ?? null,
    });
  }
  return units;
}

/** The placeholders of a message, sorted ("INTERPOLATION", "START_TAG_STRONG", …). */
const placeholders = (text: string) => [...text.matchAll(/<x id="([^"]+)"/g)].map((m) => m[1]).sort();
/** The cases of a plural or select ("=1", "other"), in order. */
const cases = (text: string) =>
  /^\{VAR_[A-Z_0-9]+, (plural|select),/.test(text.trim())
    ? [...text.replace(/<x [^>]*\/>/g, '').matchAll(/(?:^|[\s}])(=\d+|[a-z][a-z-]*) \{/g)].map((m) => m[1])
    : [];

describe.each([
  { folder: 'src/locale', who: 'the app', least: 1000 },
  { folder: 'server/locale', who: 'the server', least: 50 },
])('the Spanish translation of what $who says', ({ folder, least }) => {
  const source = unitsOf(`${folder}/messages.xlf`);
  const spanish = unitsOf(`${folder}/messages.es.xlf`);

  it('has every message, and none that is no longer said', () => {
    expect(source.size).toBeGreaterThan(least);
    const untranslated = [...source.keys()].filter((id) => !spanish.get(id)?.target?.trim());
    expect(untranslated.map((id) => `${id}: ${source.get(id)!.source}`)).toEqual([]);
    expect([...spanish.keys()].filter((id) => !source.has(id))).toEqual([]);
  });

  it('has every translation looked at again when its English changed', () => {
    // The merge keeps the old translation of a reworded message and marks it state="new".
    const stale = [
      ...readFileSync(new URL(`../../${folder}/messages.es.xlf`, import.meta.url), 'utf8').matchAll(
        /<trans-unit id="([^"]+)"[^>]*>(?:(?!<\/trans-unit>)[\s\S])*?<target state="new"/g,
      ),
    ].map((m) => `${m[1]}: ${source.get(m[1]!)?.source}`);
    expect(stale).toEqual([]);
  });

  it('keeps each message’s placeholders and plural cases', () => {
    const broken = [...spanish.values()]
      .filter((u) => u.target !== null)
      .filter(
        (u) =>
          placeholders(u.source).join() !== placeholders(u.target!).join() ||
          cases(u.source).join() !== cases(u.target!).join(),
      )
      .map((u) => `${u.id}: ${u.source} → ${u.target}`);
    expect(broken).toEqual([]);
  });

  it('is Spanish: most messages differ from the English', () => {
    const same = [...spanish.values()].filter((u) => u.target === u.source);
    // Names, formats and symbols read the same in both ("Conewise", "1v1", "°C").
    expect(same.length / spanish.size).toBeLessThan(0.05);
  });
});

describe('the languages', () => {
  it('are the ones the app is built in (angular.json) and the ones the server reads', () => {
    const angular = JSON.parse(readFileSync(new URL('../../angular.json', import.meta.url), 'utf8'));
    const i18n = angular.projects.conewise.i18n;
    expect([i18n.sourceLocale.code ?? i18n.sourceLocale, ...Object.keys(i18n.locales)]).toEqual(
      LANGUAGES.map((l) => l.locale),
    );
  });
});
