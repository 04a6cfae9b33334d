import { describe, expect, it } from 'vitest';
import {
  clockText,
  dayText,
  firstDayOfWeek,
  momentClockText,
  numberText,
  usableLocale,
} from './locale-format';

/** Intl puts a narrow no-break space before "PM" in newer ICU data; compare with plain spaces. */
const plain = (text: string) => text.replace(/[\u202f\u00a0]/g, ' ');

describe('locale formats', () => {
  it('writes clock times 24-hour in en-GB and es-ES, 12-hour in en-US', () => {
    expect(clockText(18 * 60 + 5, 'en-GB')).toBe('18:05');
    expect(clockText(9 * 60 + 45, 'en-GB')).toBe('09:45');
    expect(clockText(18 * 60 + 5, 'es-ES')).toBe('18:05');
    expect(plain(clockText(18 * 60 + 5, 'en-US'))).toBe('6:05 PM');
    expect(clockText(18 * 60 + 5, 'en-US')).not.toContain('\u202f');
    expect(plain(clockText(9 * 60 + 45, 'en-US'))).toBe('9:45 AM');
    expect(plain(clockText(-15, 'en-US'))).toBe('11:45 PM');
  });

  it('puts the day before the month in en-GB and es-ES and after it in en-US', () => {
    expect(dayText('2026-12-01', 'en-GB')).toBe('Tue 1 Dec');
    expect(dayText('2026-12-01', 'en-US')).toBe('Tue, Dec 1');
    expect(dayText('2026-12-01', 'es-ES')).toBe('mar, 1 dic');
    expect(dayText('2026-12-08', 'en-GB', 'long-day')).toBe('Tuesday 8 December');
    expect(dayText('2026-12-08', 'en-US', 'long-day')).toBe('Tuesday, December 8');
    expect(dayText('2026-12-08', 'es-ES', 'long-day')).toBe('martes, 8 de diciembre');
    expect(dayText('not a day', 'en-GB')).toBe('not a day');
  });

  it('keeps the calendar day whatever the time zone', () => {
    expect(dayText('2027-01-31', 'en-GB')).toBe('Sun 31 Jan');
    expect(momentClockText(new Date(Date.UTC(2026, 11, 1, 17, 30)), 'en-GB', 'Europe/Madrid')).toBe('18:30');
  });

  it('starts the week on Monday in en-GB and es-ES and on Sunday in en-US', () => {
    expect(firstDayOfWeek('en-GB')).toBe(1);
    expect(firstDayOfWeek('es-ES')).toBe(1);
    expect(firstDayOfWeek('en-US')).toBe(7);
  });

  it('writes numbers with the locale separators', () => {
    expect(numberText(1234.5, 'en-GB', 1)).toBe('1,234.5');
    expect(numberText(1234.5, 'en-US', 1)).toBe('1,234.5');
    expect(plain(numberText(12345.5, 'es-ES', 1))).toBe('12.345,5');
    expect(numberText(2.46, 'en-GB')).toBe('2');
  });

  it('accepts only locale tags, in canonical form', () => {
    expect(usableLocale('en-gb')).toBe('en-GB');
    expect(usableLocale('es-ES')).toBe('es-ES');
    expect(usableLocale('not a tag')).toBe('en-GB');
    expect(usableLocale('<script>', 'en-US')).toBe('en-US');
    expect(usableLocale(undefined, 'es-ES')).toBe('es-ES');
  });
});
