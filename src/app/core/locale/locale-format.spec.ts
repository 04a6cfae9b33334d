import { afterEach, describe, expect, it, vi } from 'vitest';
import { browserLocale, dayWords, numberWords, timeWords, weekStartDay } from './locale-format';

/** Intl puts a narrow no-break space before "PM" in newer ICU data; compare with plain spaces. */
const plain = (text: string) => text.replace(/[\u202f\u00a0]/g, ' ');

describe('the browser locale’s words', () => {
  afterEach(() => vi.restoreAllMocks());
  const use = (tag: string) => vi.spyOn(navigator, 'language', 'get').mockReturnValue(tag);

  it('writes days, times, numbers and the week as a British browser does', () => {
    use('en-GB');
    expect(dayWords('2026-12-01')).toBe('Tue 1 Dec');
    expect(timeWords('18:30')).toBe('18:30');
    expect(timeWords('09:05')).toBe('09:05');
    expect(numberWords(1234)).toBe('1,234');
    expect(weekStartDay()).toBe(1);
  });

  it('writes them as a US browser does: month first, 12-hour clock, Sunday first', () => {
    use('en-US');
    expect(dayWords('2026-12-01')).toBe('Tue, Dec 1');
    expect(plain(timeWords('18:30'))).toBe('6:30 PM');
    expect(weekStartDay()).toBe(0);
  });

  it('writes them as a Spanish browser does', () => {
    use('es-ES');
    expect(dayWords('2026-12-01')).toBe('mar, 1 dic');
    expect(timeWords('18:30')).toBe('18:30');
    expect(plain(numberWords(12345.6, 1))).toBe('12.345,6');
    expect(weekStartDay()).toBe(1);
  });

  it('falls back to en-GB for a locale it cannot use, and says so for missing dates and times', () => {
    use('');
    expect(browserLocale()).toBe('en-GB');
    expect(dayWords(null)).toBe('No date');
    expect(timeWords(null)).toBe('');
  });
});
