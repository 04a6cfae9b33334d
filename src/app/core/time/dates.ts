/** Calendar helpers in the coach's local time. Dates travel as YYYY-MM-DD, times as HH:MM. */

export function isoDate(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** Monday to Sunday of the week holding `today`. */
export function weekRange(today = new Date()): { from: string; to: string } {
  const monday = new Date(today);
  monday.setDate(today.getDate() - ((today.getDay() + 6) % 7));
  const sunday = new Date(monday);
  sunday.setDate(monday.getDate() + 6);
  return { from: isoDate(monday), to: isoDate(sunday) };
}

/** "HH:MM" → minutes after midnight, or null. */
export function minutesOfDay(time: string | null | undefined): number | null {
  const match = /^(\d{1,2}):(\d{2})$/.exec(time ?? '');
  return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

/** Minutes after midnight → "HH:MM" (wraps past midnight). */
export function clockTime(minutes: number): string {
  const wrapped = ((Math.round(minutes) % 1440) + 1440) % 1440;
  return `${String(Math.floor(wrapped / 60)).padStart(2, '0')}:${String(wrapped % 60).padStart(2, '0')}`;
}

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** "2026-12-01" → "Tue 1 Dec". Spelled out here rather than by Intl: the first Intl date format
 *  of a page costs a slow phone about 0.2 s of locale loading on the plan page's first screen. */
export function shortDay(date: string | null): string {
  if (!date) return 'No date';
  const [y, m, d] = date.split('-').map(Number);
  const day = new Date(y, m - 1, d);
  return `${WEEKDAYS[day.getDay()]} ${day.getDate()} ${MONTHS[day.getMonth()]}`;
}
