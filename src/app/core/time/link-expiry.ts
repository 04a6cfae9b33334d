import { momentClockWords, momentDayWords, momentWords } from '../locale/locale-format';

/**
 * When a link stops working, in the reader's own time and locale: "the end of Wed 9 Dec" for a
 * link that ends at midnight, else "Fri 4 Dec, 17:30" (en-GB) or "Fri, Dec 4, 5:30 PM" (en-US).
 */
export function untilWords(expiresAt: string): string {
  const end = new Date(expiresAt);
  if (end.getHours() === 0 && end.getMinutes() === 0) {
    const day = momentDayWords(new Date(end.getTime() - 60_000));
    return $localize`:When a link stops working, e.g. the end of Wed 9 Dec:the end of ${day}:day:`;
  }
  return `${momentDayWords(end)}, ${momentClockWords(end)}`;
}

/** "Tue 1 Dec, 16:20" (en-GB) for when something was made. */
export function madeWords(createdAt: string): string {
  return momentWords(createdAt);
}
