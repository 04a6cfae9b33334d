/**
 * The languages Conewise speaks, in one place: the app is built once per language (angular.json's
 * i18n locales), the server sends each reader their language's build and answers the API, prints
 * cards and writes e-mails in it.
 */

/** A language, named in itself (common practice: a reader finds their own). */
export interface Language {
  /** The language's code: "en", "es". */
  code: string;
  /** The locale its build is made for (angular.json: sourceLocale or a locale). */
  locale: string;
  name: string;
}

export const LANGUAGES = [
  { code: 'en', locale: 'en-GB', name: 'English' },
  { code: 'es', locale: 'es', name: 'Español' },
] as const satisfies readonly Language[];

export type LanguageCode = (typeof LANGUAGES)[number]['code'];

/** The language the words are written in: chosen when the reader's is not one of ours. */
export const SOURCE_LANGUAGE: LanguageCode = 'en';

/** The cookie that keeps the language a person chose ("en", "es") for a year. */
export const LANGUAGE_COOKIE = 'cw-lang';

/** "en-GB" → "en", "es" → "es". */
export const languageOf = (locale: string): string => locale.split('-')[0]!.toLowerCase();

export const isLanguageCode = (code: unknown): code is LanguageCode =>
  LANGUAGES.some((language) => language.code === code);

/** The language chosen in a request's Cookie header, when it is one of ours. */
export function chosenLanguage(cookieHeader: string | undefined): LanguageCode | null {
  for (const part of (cookieHeader ?? '').split(';')) {
    const [name, value] = part.trim().split('=');
    if (name === LANGUAGE_COOKIE && isLanguageCode(value)) return value;
  }
  return null;
}
