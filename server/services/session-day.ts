/**
 * Dates and clock times in words for the printed card and e-mails, in a person's locale (their
 * stored `app_user.locale`, else AppConfig.locale) and the club's time zone (the club's `timeZone`
 * column). Dates travel as YYYY-MM-DD, times as HH:MM; the words come from shared/time's
 * locale formats (the browser uses the same ones), zone arithmetic from dayjs (local-time.ts),
 * clock times of a plan from shared/time/session-clock.
 */
import '../../shared/i18n/localize';
import { clockText, dayText, momentClockText, type DayStyle } from '../../shared/time/locale-format';
import { parseClock, type SessionClock } from '../../shared/time/session-clock';
import { dayjs, zonedMoment } from './local-time';

const HOUR_MS = 3_600_000;

/** A link to a plan without a date works this long after it is made. */
export const UNDATED_HELPER_LINK_HOURS = 48;

/** "2026-12-08" → "Tuesday 8 December" (en-GB), "Tuesday, December 8" (en-US); the calendar day itself, whatever the zone. */
export function dayInWords(date: string, locale: string, style: DayStyle = 'long-day'): string {
  return dayText(date, locale, style);
}

/** A stored "HH:MM" in the locale's clock: "18:00" (en-GB), "6:00 PM" (en-US); as given when malformed. */
export function timeInWords(hhmm: string, locale: string): string {
  const minutes = parseClock(hhmm);
  return minutes === null ? hhmm : clockText(minutes, locale);
}

/** "Tuesday 8 December, 18:00"; the day alone without a time; null without a date. */
export function sessionInWords(date: string | null, time: string | null, locale: string): string | null {
  if (!date) return null;
  return time ? `${dayInWords(date, locale)}, ${timeInWords(time, locale)}` : dayInWords(date, locale);
}

/** A plan minute on the clock in the locale's style ("18:15", "6:15 PM"), or "min 15" when the plan has no time. */
export function minuteInWords(clock: SessionClock, minute: number, locale: string): string {
  const at = clock.at(minute);
  return at === null
    ? $localize`:a minute of a plan that has no clock time, min short for minute:min ${minute}:minute:`
    : clockText(at, locale);
}

/**
 * When a helper link stops working: at the end of the day after the session in the club's time
 * zone (midnight two days on), or UNDATED_HELPER_LINK_HOURS after it is made for a plan with no date.
 */
export function helperLinkExpiry(date: string | null, now: Date, timeZone: string): Date {
  if (!date) return new Date(now.getTime() + UNDATED_HELPER_LINK_HOURS * HOUR_MS);
  const twoDaysOn = dayjs.utc(date).add(2, 'day').format('YYYY-MM-DD');
  return zonedMoment(twoDaysOn, '00:00', timeZone).toDate();
}

/** "the end of Wednesday 9 December" for a link that ends at midnight, else "Thursday 10 December, 18:05". */
export function expiryInWords(expiresAt: Date, locale: string, timeZone: string): string {
  const local = dayjs(expiresAt).tz(timeZone);
  if (local.hour() === 0 && local.minute() === 0) {
    const day = dayInWords(local.subtract(1, 'day').format('YYYY-MM-DD'), locale);
    return $localize`:when a link stops working, e.g. the end of Wednesday 9 December:the end of ${day}:day:`;
  }
  return `${dayInWords(local.format('YYYY-MM-DD'), locale)}, ${momentClockText(expiresAt, locale, timeZone)}`;
}
