/** Calendar arithmetic in the coach's local time. Dates travel as YYYY-MM-DD; words for them are core/locale's. */
import { weekStartDay } from '../locale/locale-format';

export function isoDate(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/**
 * The seven days of the week holding `today`, from the locale's first day of the week (Monday in
 * en-GB, Sunday in en-US); `firstDay` counts as Date.getDay() does (0 Sunday … 6 Saturday).
 */
export function weekRange(today = new Date(), firstDay = weekStartDay()): { from: string; to: string } {
  const first = new Date(today);
  first.setDate(today.getDate() - ((today.getDay() - firstDay + 7) % 7));
  const last = new Date(first);
  last.setDate(first.getDate() + 6);
  return { from: isoDate(first), to: isoDate(last) };
}
