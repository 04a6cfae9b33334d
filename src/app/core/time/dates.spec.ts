import { clockTime, minutesOfDay, shortDay, weekRange } from './dates';

describe('dates', () => {
  it('writes a day as a coach reads it: weekday, day of the month, month', () => {
    expect(shortDay('2026-12-01')).toBe('Tue 1 Dec');
    expect(shortDay('2027-01-31')).toBe('Sun 31 Jan');
    expect(shortDay('2028-02-29')).toBe('Tue 29 Feb');
    expect(shortDay(null)).toBe('No date');
  });

  it('agrees with the browser’s own British short date for every day of a year (Sep for Sept)', () => {
    const british = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short' });
    for (let day = new Date(2026, 0, 1); day.getFullYear() === 2026; day.setDate(day.getDate() + 1)) {
      const iso = `2026-${String(day.getMonth() + 1).padStart(2, '0')}-${String(day.getDate()).padStart(2, '0')}`;
      // ICU writes September "Sept"; the app keeps three letters for every month.
      expect(shortDay(iso), iso).toBe(british.format(day).replace(',', '').replace('Sept', 'Sep'));
    }
  });

  it('reads and writes clock times and finds Monday to Sunday', () => {
    expect(minutesOfDay('09:45')).toBe(585);
    expect(minutesOfDay('nine')).toBeNull();
    expect(clockTime(-15)).toBe('23:45');
    expect(weekRange(new Date(2026, 11, 3))).toEqual({ from: '2026-11-30', to: '2026-12-06' });
  });
});
