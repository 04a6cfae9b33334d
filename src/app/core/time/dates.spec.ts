import { afterEach, describe, expect, it, vi } from 'vitest';
import { isoDate, weekRange } from './dates';

describe('dates', () => {
  afterEach(() => vi.restoreAllMocks());

  it('writes a local day as YYYY-MM-DD', () => {
    expect(isoDate(new Date(2026, 11, 3))).toBe('2026-12-03');
  });

  it('finds the week from the given first day: Monday to Sunday, or Sunday to Saturday', () => {
    // Thursday 3 December 2026.
    expect(weekRange(new Date(2026, 11, 3), 1)).toEqual({ from: '2026-11-30', to: '2026-12-06' });
    expect(weekRange(new Date(2026, 11, 3), 0)).toEqual({ from: '2026-11-29', to: '2026-12-05' });
    // A Sunday is the last day of a Monday week and the first of a Sunday week.
    expect(weekRange(new Date(2026, 11, 6), 1)).toEqual({ from: '2026-11-30', to: '2026-12-06' });
    expect(weekRange(new Date(2026, 11, 6), 0)).toEqual({ from: '2026-12-06', to: '2026-12-12' });
  });

  it('starts the week on the browser locale’s first day', () => {
    const language = vi.spyOn(navigator, 'language', 'get');
    language.mockReturnValue('en-US');
    expect(weekRange(new Date(2026, 11, 3)).from).toBe('2026-11-29');
    language.mockReturnValue('en-GB');
    expect(weekRange(new Date(2026, 11, 3)).from).toBe('2026-11-30');
    language.mockReturnValue('es-ES');
    expect(weekRange(new Date(2026, 11, 3)).from).toBe('2026-11-30');
  });
});
