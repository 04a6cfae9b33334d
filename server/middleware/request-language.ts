import type { Request, RequestHandler } from 'express';
import { chosenLanguage, LANGUAGES, type LanguageCode, SOURCE_LANGUAGE } from '../../shared/i18n/languages';
import { inLanguage } from '../i18n/translations';

const ALL = LANGUAGES.map((language) => language.code);

/**
 * The reader's language among those offered: the one they chose (the cookie), else the first of
 * their browser's languages (Accept-Language, negotiated by Express) that is offered, else the
 * source's. The app sends its own build's language in Accept-Language, so the API answers in the
 * language on screen.
 */
export function languageFor(req: Request, offered: readonly string[] = ALL): LanguageCode {
  // The error handler asks too, and must answer even for a request that never fully arrived.
  const headers = req.headers ?? {};
  const chosen = chosenLanguage(headers.cookie);
  if (chosen && offered.includes(chosen)) return chosen;
  const accepted = headers['accept-language'] ? req.acceptsLanguages(...offered) : false;
  return (accepted || (offered.includes(SOURCE_LANGUAGE) ? SOURCE_LANGUAGE : offered[0])) as LanguageCode;
}

/**
 * Answers the request in the reader's language: every `$localize` word the route, its services,
 * the engine and the card code write is translated (server/i18n/translations.ts). Placed after
 * the body parsers, and again after a file upload: words run from a stream's events would
 * otherwise lose the request's language.
 */
export const speakTheirLanguage: RequestHandler = (req, res, next) => {
  const language = languageFor(req);
  res.setHeader('Content-Language', language);
  inLanguage(language, next);
};
