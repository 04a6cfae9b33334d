/**
 * A session's day in words and the end of a helper link's life, in the club's locale and time
 * zone (AppConfig.locale, AppConfig.timeZone). Dates travel as YYYY-MM-DD, times as HH:MM.
 */

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

/** Milliseconds the zone is ahead of UTC at `instant`. */
function zoneOffsetMs(instant: number, timeZone: string): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: 'numeric',
    day: 'numeric',
    hour: 'numeric',
    minute: 'numeric',
    second: 'numeric',
  }).formatToParts(new Date(instant));
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value ?? 0);
  const asUtc = Date.UTC(
    get('year'),
    get('month') - 1,
    get('day'),
    get('hour'),
    get('minute'),
    get('second'),
  );
  return asUtc - Math.floor(instant / 1000) * 1000;
}

/** The instant a calendar day starts in a time zone (checked twice, so a change of clocks that day is honoured). */
export function startOfDay(y: number, m: number, d: number, timeZone: string): Date {
  const guess = Date.UTC(y, m - 1, d);
  let instant = guess - zoneOffsetMs(guess, timeZone);
  instant = guess - zoneOffsetMs(instant, timeZone);
  return new Date(instant);
}

/**
 * When a helper link stops working: at the end of the day after the session in the club's time
 * zone (midnight two days on), or UNDATED_HELPER_LINK_HOURS after it is made for a plan with no date.
 */
export function helperLinkExpiry(date: string | null, now: Date, timeZone: string): Date {
  if (!date) return new Date(now.getTime() + UNDATED_HELPER_LINK_HOURS * HOUR_MS);
  const [y, m, d] = dayParts(date);
  return startOfDay(y, m, d + 2, timeZone);
}

/** "the end of Wednesday 9 December" for a link that ends at midnight, else "Thursday 10 December, 18:05". */
export function expiryInWords(expiresAt: Date, locale: string, timeZone: string): string {
  const local = new Date(expiresAt.getTime() + zoneOffsetMs(expiresAt.getTime(), timeZone));
  const atMidnight = local.getUTCHours() === 0 && local.getUTCMinutes() === 0;
  if (atMidnight) {
    const dayBefore = new Date(local.getTime() - 24 * HOUR_MS).toISOString().slice(0, 10);
    return `the end of ${dayInWords(dayBefore, locale)}`;
  }
  const time = local.toISOString().slice(11, 16);
  return `${dayInWords(local.toISOString().slice(0, 10), locale)}, ${time}`;
}
