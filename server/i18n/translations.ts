/**
 * The server speaks the reader's language: the words it writes (plan notices, the engine's step
 * words, the printed card, e-mails, API messages) are marked with `$localize` like the app's and
 * translated on each request from the same XLIFF files the app's builds use.
 *
 * The language of a request is held for everything that request runs (Node's AsyncLocalStorage),
 * so a service, the engine or the card code needs no language argument: `$localize` looks it up.
 * Words outside a request (a log line, a start-up message) stay in the source language.
 */
import { AsyncLocalStorage } from 'node:async_hooks';
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import {
  ɵisMissingTranslationError as isMissingTranslationError,
  ɵparseTranslation as parseTranslation,
  ɵtranslate as translate,
  type ɵParsedTranslation as ParsedTranslation,
} from '@angular/localize';
import { XMLParser } from 'fast-xml-parser';
import '../../shared/i18n/localize';
import { LANGUAGES, type LanguageCode, SOURCE_LANGUAGE } from '../../shared/i18n/languages';

/** The XLIFF files of a language: the app's (with the engine's and shared words) and the server's own. */
export function translationFiles(language: string): string[] {
  return [
    fileURLToPath(new URL(`../../src/locale/messages.${language}.xlf`, import.meta.url)),
    fileURLToPath(new URL(`../locale/messages.${language}.xlf`, import.meta.url)),
  ];
}

type XmlNode = Record<string, XmlNode[] | string | Record<string, string>>;

/** A target's text with its placeholders as `{$NAME}`, the form `$localize` translations take. */
function messageText(nodes: XmlNode[]): string {
  return nodes
    .map((node) => {
      if (typeof node['#text'] === 'string') return node['#text'];
      if ('x' in node) return `{$${(node[':@'] as Record<string, string>)['@_id']}}`;
      return '';
    })
    .join('');
}

function childrenNamed(nodes: XmlNode[], name: string): XmlNode[][] {
  return nodes.filter((node) => name in node).map((node) => node[name] as XmlNode[]);
}

/**
 * Each message's translation in an XLIFF 1.2 file (what `ng extract-i18n` and our server's
 * extraction write), read with fast-xml-parser; messages without a target are left out.
 */
export function readXliff(xml: string): Record<string, string> {
  const parser = new XMLParser({
    ignoreAttributes: false,
    preserveOrder: true,
    trimValues: false,
    processEntities: true,
  });
  const doc = parser.parse(xml) as XmlNode[];
  const messages: Record<string, string> = {};
  for (const xliff of childrenNamed(doc, 'xliff'))
    for (const file of childrenNamed(xliff, 'file'))
      for (const body of childrenNamed(file, 'body'))
        for (const unit of body.filter((node) => 'trans-unit' in node)) {
          const id = (unit[':@'] as Record<string, string>)['@_id']!;
          const [target] = childrenNamed(unit['trans-unit'] as XmlNode[], 'target');
          if (target) messages[id] = messageText(target);
        }
  return messages;
}

const speaking = new AsyncLocalStorage<LanguageCode>();

/** The language of the request being answered (the source language outside a request). */
export const currentLanguage = (): LanguageCode => speaking.getStore() ?? SOURCE_LANGUAGE;

/** Runs `work` with every `$localize` word in `language`. */
export function inLanguage<T>(language: LanguageCode, work: () => T): T {
  return speaking.run(language, work);
}

let installed = false;

/**
 * Reads every language's translations once and makes `$localize` translate into the current
 * request's language. A message without a translation stays in the source language (the tests
 * check that none is missing).
 */
export function installTranslations(): void {
  if (installed) return;
  installed = true;
  const byLanguage = new Map<LanguageCode, Record<string, ParsedTranslation>>();
  for (const { code } of LANGUAGES) {
    if (code === SOURCE_LANGUAGE) continue;
    const parsed: Record<string, ParsedTranslation> = {};
    for (const file of translationFiles(code).filter((f) => existsSync(f)))
      for (const [id, text] of Object.entries(readXliff(readFileSync(file, 'utf8'))))
        parsed[id] = parseTranslation(text);
    byLanguage.set(code, parsed);
  }
  $localize.translate = (messageParts, substitutions) => {
    const translations = byLanguage.get(currentLanguage());
    if (!translations) return [messageParts, substitutions];
    try {
      return translate(translations, messageParts, substitutions);
    } catch (error) {
      if (isMissingTranslationError(error)) return [messageParts, substitutions];
      throw error;
    }
  };
}
