/**
 * The starting rules' words in the reader's language (shared/i18n/rule-set-words.ts): a rule set
 * is stored with them in the source language and read in the request's language; what a reader
 * sends back (an edited draft) is stored in the source language again, so a club's history, its
 * differences and every other reader see one text whatever language it was edited in.
 */
import { LANGUAGES, type LanguageCode, SOURCE_LANGUAGE } from '../../shared/i18n/languages';
import { mapRuleSetWords } from '../../shared/i18n/rule-set-words';
import spanish from '../../rules/words/es.json';
import { currentLanguage } from './translations';

/** Each language's translation of the starting rules' sentences, keyed by the source sentence. */
export const RULE_WORDS: Partial<Record<LanguageCode, Readonly<Record<string, string>>>> = { es: spanish };

/** Any language's sentence → its source sentence. */
const toSource = new Map<string, string>();
for (const { code } of LANGUAGES)
  for (const [source, translated] of Object.entries(RULE_WORDS[code] ?? {}))
    if (!toSource.has(translated)) toSource.set(translated, source);

const sourceOf = (text: string) => toSource.get(text) ?? text;

/** A document in the reader's language, the same object each time for the same document and language. */
const translatedDocuments = new WeakMap<object, Map<LanguageCode, object>>();

/** `document` with the starting rules' words in `language` (the current request's by default). */
export function inReaderWords<T extends object>(document: T, language = currentLanguage()): T {
  if (language === SOURCE_LANGUAGE || !RULE_WORDS[language]) return document;
  const words = RULE_WORDS[language];
  let byLanguage = translatedDocuments.get(document);
  if (!byLanguage) translatedDocuments.set(document, (byLanguage = new Map()));
  let translated = byLanguage.get(language) as T | undefined;
  if (!translated) {
    translated = mapRuleSetWords(document, (text) => words[sourceOf(text)] ?? text);
    byLanguage.set(language, translated);
  }
  return translated;
}

/** `document` with every starting rules' sentence, in whatever language, back in the source language. */
export function inSourceWords<T>(document: T): T {
  return mapRuleSetWords(document, sourceOf);
}

/**
 * One change of a rule set (a JSON pointer and what it said before and after) in the reader's
 * words: a history line shows the starting rules' sentences in the reader's language too.
 */
export function changeInReaderWords<C extends { path: string; before?: unknown; after?: unknown }>(
  change: C,
): C {
  const segments = change.path.split('/').filter(Boolean);
  const inList = /^\d+$/.test(segments.at(-1) ?? '');
  const key = (inList ? segments.at(-2) : segments.at(-1)) ?? '';
  const read = (value: unknown) => {
    if (value === undefined) return value;
    const wrapped = { [key]: inList ? [value] : value };
    const translated = inReaderWords(wrapped)[key];
    return inList ? (translated as unknown[])[0] : translated;
  };
  return {
    ...change,
    ...('before' in change ? { before: read(change.before) } : {}),
    ...('after' in change ? { after: read(change.after) } : {}),
  };
}
