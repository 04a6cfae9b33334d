import { HttpInterceptorFn } from '@angular/common/http';
import { LOCALE_ID, inject } from '@angular/core';
import { languageOf } from '../../../../shared/i18n/languages';

/**
 * Asks the API to answer in the language on screen (this build's), so a plan's notices, the
 * card and e-mails read like the screens around them whatever else the browser prefers.
 */
export const languageInterceptor: HttpInterceptorFn = (request, next) => {
  const language = languageOf(inject(LOCALE_ID));
  if (!request.url.startsWith('/api') || request.headers.has('Accept-Language')) return next(request);
  return next(request.clone({ setHeaders: { 'Accept-Language': language } }));
};
