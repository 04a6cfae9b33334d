/**
 * A session's day in words and the end of a helper link's life, in the club's locale and time
 * zone (AppConfig.locale; the club's `timeZone` column). Dates travel as YYYY-MM-DD, times as
 * HH:MM; zone arithmetic is dayjs's (local-time.ts), shared with the schedule and calendar feed.
 */
import { dayjs, zonedMoment } from './local-time';

const HOUR_MS = 3_600_000;

/** A link to a plan without a date works this long after it is made. */
export const UNDATED_HELPER_LINK_HOURS = 48;

function dayParts(date: string): [number, number, number] {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return [y, m, d];
}

/** "2026-12-08" → "Tuesday 8 December" (en-GB); the calendar day itself, whatever the zone. */
export function dayInWords(date: string, locale: string): string {
  const [y, m, d] = dayParts(date);
  return new Intl.DateTimeFormat(locale, {
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    timeZone: 'UTC',
  }).format(new Date(Date.UTC(y, m - 1, d)));
}

/** "Tuesday 8 December, 18:00"; the day alone without a time; null without a date. */
export function sessionInWords(date: string | null, kickOff: string | null, locale: string): string | null {
  if (!date) return null;
  return kickOff ? `${dayInWords(date, locale)}, ${kickOff}` : dayInWords(date, locale);
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
    return `the end of ${dayInWords(local.subtract(1, 'day').format('YYYY-MM-DD'), locale)}`;
  }
  return `${dayInWords(local.format('YYYY-MM-DD'), locale)}, ${local.format('HH:mm')}`;
}
