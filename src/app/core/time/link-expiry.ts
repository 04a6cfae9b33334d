/**
 * When a link stops working, in the reader's own time: "the end of Wed 9 Dec" for a link that
 * ends at midnight, else "Fri 4 Dec, 17:30".
 */
export function untilWords(expiresAt: string): string {
  const end = new Date(expiresAt);
  const day = (d: Date) =>
    d.toLocaleDateString('en-GB', { weekday: 'short', day: 'numeric', month: 'short' });
  if (end.getHours() === 0 && end.getMinutes() === 0) {
    const before = new Date(end.getTime() - 60_000);
    return `the end of ${day(before)}`;
  }
  const time = end.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
  return `${day(end)}, ${time}`;
}

/** "Tue 1 Dec, 16:20" for when something was made. */
export function madeWords(createdAt: string): string {
  const at = new Date(createdAt);
  const day = at.toLocaleDateString('en-GB', { weekday: 'short', day: 'numeric', month: 'short' });
  return `${day}, ${at.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' })}`;
}
