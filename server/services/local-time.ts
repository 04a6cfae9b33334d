import dayjs, { type Dayjs } from 'dayjs';
import timezone from 'dayjs/plugin/timezone.js';
import utc from 'dayjs/plugin/utc.js';

dayjs.extend(utc);
dayjs.extend(timezone);

export { dayjs };

/** Today's date (YYYY-MM-DD) in a time zone. */
export function todayIn(zone: string, now: Date = new Date()): string {
  return dayjs(now).tz(zone).format('YYYY-MM-DD');
}

/** A local day and HH:MM in a time zone as a zoned moment (right on either side of a clock change). */
export function zonedMoment(date: string, time: string, zone: string): Dayjs {
  return dayjs.tz(`${date}T${time}:00`, zone);
}
