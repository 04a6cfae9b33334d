/**
 * Dates, clock times, numbers and the first day of the week in the browser's own locale
 * (navigator.language): the one place the client turns them into words. The formats themselves
 * are shared/time/locale-format's, which the server uses with the person's stored locale for the
 * printed card and e-mails, so screen and paper agree. Formatters are made on first use and kept
 * (the first one loads locale data, about 0.2 s on a slow phone), never at start-up.
 */
import {
  clockText,
  dayText,
  firstDayOfWeek,
  momentClockText,
  momentDayText,
  numberText,
  usableLocale,
  type DayStyle,
} from '../../../../shared/time/locale-format';
import { parseClock } from '../../../../shared/time/session-clock';

/**
 * The browser's locale, canonical ("en-US"); en-GB when the browser gives none usable. When the
 * app is shown in another language than the browser's (a coach chose Spanish on an English
 * phone), the app's language (`<html lang>`, set by each language's build) so dates read in it.
 */
export function browserLocale(): string {
  const browser = usableLocale(globalThis.navigator?.language);
  const page = globalThis.document?.documentElement.lang;
  if (!page || page.split('-')[0]!.toLowerCase() === browser.split('-')[0]!.toLowerCase()) return browser;
  return usableLocale(page);
}

/** "Tue 1 Dec" (en-GB), "Tue, Dec 1" (en-US) for a YYYY-MM-DD day; "No date" without one. */
export function dayWords(date: string | null | undefined, style: DayStyle = 'short-day'): string {
  return date ? dayText(date, browserLocale(), style) : $localize`No date`;
}

/** Minutes since midnight as a clock time: "18:05" (en-GB), "6:05 PM" (en-US). */
export function clockWords(minutes: number): string {
  return clockText(minutes, browserLocale());
}

/** A stored "HH:MM" time in the browser's clock style; empty without one, as given when malformed. */
export function timeWords(hhmm: string | null | undefined): string {
  if (!hhmm) return '';
  const minutes = parseClock(hhmm);
  return minutes === null ? hhmm : clockWords(minutes);
}

/** A moment's day in the reader's own time zone: "Tue 1 Dec" (en-GB). */
export function momentDayWords(at: Date | string, style: DayStyle = 'short-day'): string {
  return momentDayText(new Date(at), browserLocale(), style);
}

/** A moment's clock time in the reader's own time zone: "16:20" (en-GB), "4:20 PM" (en-US). */
export function momentClockWords(at: Date | string): string {
  return momentClockText(new Date(at), browserLocale());
}

/** "Tue 1 Dec, 16:20" (en-GB) for a moment, in the reader's own time zone. */
export function momentWords(at: Date | string, style: DayStyle = 'short-day'): string {
  return `${momentDayWords(at, style)}, ${momentClockWords(at)}`;
}

/** A number with the browser's separators, at most `fractionDigits` decimals. */
export function numberWords(value: number, fractionDigits = 0): string {
  return numberText(value, browserLocale(), fractionDigits);
}

/** The first day of the browser's week as Date.getDay() counts: 0 Sunday … 6 Saturday (Monday when unknown). */
export function weekStartDay(): number {
  return firstDayOfWeek(browserLocale()) % 7;
}
