/**
 * Dates, clock times and numbers in words for a locale (a BCP 47 tag such as en-GB, en-US,
 * es-ES): the browser formats with the browser's locale, the server (printed card, e-mails) with
 * the user's stored one, both through these functions, so screen and paper agree. Built on Intl
 * only (no Node or DOM). Creating the first Intl formatter loads locale data, which costs a slow
 * phone about 0.2 s (measured on the plan page's first screen), so formatters are made on first
 * use and kept, one per locale and style.
 */

import { wrapDay } from './session-clock';

/** The locale used when none is given or the one given is not a valid tag. */
export const FALLBACK_LOCALE = 'en-GB';

/** A BCP 47 tag as stored and accepted by the API: language, optional script, region or variants. */
export const LOCALE_PATTERN = /^[A-Za-z]{2,3}(-[A-Za-z0-9]{2,8}){0,3}$/;

/** Longest locale tag kept (app_user.locale is varchar(35)). */
export const LOCALE_MAX_LENGTH = 35;

const formatters = new Map<string, Intl.DateTimeFormat | Intl.NumberFormat>();
const canonical = new Map<string, string>();

/** The canonical form of a locale tag ("en-gb" → "en-GB"), or `fallback` when it is not one. */
export function usableLocale(tag: string | null | undefined, fallback = FALLBACK_LOCALE): string {
  if (!tag || tag.length > LOCALE_MAX_LENGTH || !LOCALE_PATTERN.test(tag)) return fallback;
  let known = canonical.get(tag);
  if (known === undefined) {
    try {
      known = Intl.getCanonicalLocales(tag)[0] ?? '';
    } catch {
      known = '';
    }
    canonical.set(tag, known);
  }
  return known || fallback;
}

type DateStyle =
  | 'short-day'
  | 'long-day'
  | 'short-day-year'
  | 'day-month'
  | 'day-month-year'
  | 'clock'
  | 'clock-24';

const DATE_OPTIONS: Record<DateStyle, Intl.DateTimeFormatOptions> = {
  'short-day': { weekday: 'short', day: 'numeric', month: 'short' },
  'long-day': { weekday: 'long', day: 'numeric', month: 'long' },
  'short-day-year': { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' },
  'day-month': { day: 'numeric', month: 'short' },
  'day-month-year': { day: 'numeric', month: 'short', year: 'numeric' },
  clock: { hour: 'numeric', minute: '2-digit' },
  // A 24-hour clock keeps two-digit hours, as on a timetable ("09:45").
  'clock-24': { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' },
};

/**
 * Newer ICU data puts a narrow no-break space (U+202F) before "PM"; the card's font has no such
 * character, so every format uses the plain no-break space (U+00A0) instead, on screen and on paper.
 */
function spaced(text: string): string {
  return text.replace(/\u202f/g, '\u00a0');
}

function dateFormat(locale: string, style: DateStyle, timeZone: string | undefined): Intl.DateTimeFormat {
  const key = `d|${locale}|${style}|${timeZone ?? ''}`;
  let format = formatters.get(key) as Intl.DateTimeFormat | undefined;
  if (!format) {
    format = new Intl.DateTimeFormat(locale, { ...DATE_OPTIONS[style], ...(timeZone ? { timeZone } : {}) });
    formatters.set(key, format);
  }
  return format;
}

const twentyFourHour = new Map<string, boolean>();

/** Whether the locale writes times on a 24-hour clock (en-GB, es-ES) rather than a 12-hour one (en-US). */
export function usesTwentyFourHourClock(locale: string): boolean {
  let known = twentyFourHour.get(locale);
  if (known === undefined) {
    known = dateFormat(locale, 'clock', 'UTC').resolvedOptions().hour12 !== true;
    twentyFourHour.set(locale, known);
  }
  return known;
}

function clockFormat(locale: string, timeZone: string | undefined): Intl.DateTimeFormat {
  return dateFormat(locale, usesTwentyFourHourClock(locale) ? 'clock-24' : 'clock', timeZone);
}

function calendarDay(date: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  if (!match) return null;
  const day = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]), 12));
  return Number.isNaN(day.getTime()) ? null : day;
}

/** Styles for a calendar day: "Tue 1 Dec", "Tuesday 1 December", "Tue 1 Dec 2026", "1 Dec", "1 Dec 2026" (en-GB). */
export type DayStyle = Exclude<DateStyle, 'clock' | 'clock-24'>;

/** A calendar day (YYYY-MM-DD) in words; the day itself whatever the time zone. Malformed input comes back as is. */
export function dayText(date: string, locale: string, style: DayStyle = 'short-day'): string {
  const day = calendarDay(date);
  return day ? spaced(dateFormat(locale, style, 'UTC').format(day)) : date;
}

/** A moment's calendar day in words, in `timeZone` (the reader's own when not given). */
export function momentDayText(
  at: Date,
  locale: string,
  style: DayStyle = 'short-day',
  timeZone?: string,
): string {
  return spaced(dateFormat(locale, style, timeZone).format(at));
}

/** A moment's clock time in the locale's style ("18:05", "6:05 PM"), in `timeZone` (the reader's own when not given). */
export function momentClockText(at: Date, locale: string, timeZone?: string): string {
  return spaced(clockFormat(locale, timeZone).format(at));
}

/** Minutes since midnight as a clock time in the locale's style: "18:05" (en-GB, es-ES), "6:05 PM" (en-US). */
export function clockText(minutes: number, locale: string): string {
  const m = wrapDay(minutes);
  return spaced(
    clockFormat(locale, 'UTC').format(new Date(Date.UTC(2000, 0, 1, Math.floor(m / 60), m % 60))),
  );
}

/** A number in the locale's style, at most `fractionDigits` decimals: "1,234.5" (en-GB), "1234,5" (es-ES). */
export function numberText(value: number, locale: string, fractionDigits = 0): string {
  const key = `n|${locale}|${fractionDigits}`;
  let format = formatters.get(key) as Intl.NumberFormat | undefined;
  if (!format) {
    format = new Intl.NumberFormat(locale, { maximumFractionDigits: fractionDigits });
    formatters.set(key, format);
  }
  return spaced(format.format(value));
}

interface WeekInfo {
  firstDay?: number;
}
type LocaleWithWeek = Intl.Locale & { weekInfo?: WeekInfo; getWeekInfo?: () => WeekInfo };

const firstDays = new Map<string, number>();

/**
 * The locale's first day of the week, 1 (Monday) to 7 (Sunday), from Intl.Locale's week info
 * where the runtime has it (`getWeekInfo()` or the older `weekInfo`), else Monday (ISO 8601).
 */
export function firstDayOfWeek(locale: string): number {
  let first = firstDays.get(locale);
  if (first === undefined) {
    first = 1;
    try {
      const tag = new Intl.Locale(locale) as LocaleWithWeek;
      const info = typeof tag.getWeekInfo === 'function' ? tag.getWeekInfo() : tag.weekInfo;
      if (info?.firstDay && info.firstDay >= 1 && info.firstDay <= 7) first = info.firstDay;
    } catch {
      first = 1;
    }
    firstDays.set(locale, first);
  }
  return first;
}
