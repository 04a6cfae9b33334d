import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import requestSchema from '../schemas/plan-request.schema.json';
import {
  celsiusFrom,
  distanceLimitsIn,
  effectiveUnits,
  formatArea,
  formatDistance,
  formatSize,
  formatTemperature,
  inUnitsText,
  metresFrom,
  temperatureLimitsIn,
  wholeDistance,
  wholeTemperature,
  type NumberLimits,
} from './index';

const space = requestSchema.properties.space.properties;
const temperature = requestSchema.properties.conditions.properties.temperatureC as NumberLimits;

/** Every whole number a field with these limits takes. */
function wholeNumbersWithin(limits: NumberLimits): fc.Arbitrary<number> {
  const low =
    limits.minimum ??
    (limits.exclusiveMinimum !== undefined ? Math.floor(limits.exclusiveMinimum) + 1 : -1000);
  const high =
    limits.maximum ?? (limits.exclusiveMaximum !== undefined ? Math.ceil(limits.exclusiveMaximum) - 1 : 1000);
  return fc.integer({ min: low, max: high });
}

describe('conversions round-trip for every whole number a coach can type in the wizard', () => {
  for (const field of ['width', 'length'] as const) {
    it(`${field}: yards → metres (the request) → the same whole yards, inside the schema's limits`, () => {
      const limits = distanceLimitsIn('yards', space[field]);
      // The schema's 200 m is 218.7 yd: 218 is the most a coach may type, 1 the least.
      expect(limits).toEqual({ exclusiveMinimum: 0, maximum: 218 });
      fc.assert(
        fc.property(wholeNumbersWithin(limits), (yards) => {
          const metres = metresFrom('yards', yards);
          expect(metres).toBeGreaterThan(space[field].exclusiveMinimum);
          expect(metres).toBeLessThanOrEqual(space[field].maximum);
          expect(wholeDistance('yards', metres)).toBe(yards);
        }),
        { numRuns: 500 },
      );
    });
  }

  it('the exact cases a coach reads about: 40 yd and 60 yd', () => {
    expect(wholeDistance('yards', metresFrom('yards', 40))).toBe(40);
    expect(formatDistance('yards', metresFrom('yards', 60))).toBe('60 yd');
  });

  it('metres stay as typed', () => {
    fc.assert(
      fc.property(wholeNumbersWithin(space.width), (m) => {
        expect(metresFrom('metres', m)).toBe(m);
        expect(wholeDistance('metres', m)).toBe(m);
      }),
    );
  });

  it('°F → °C (the request) → the same whole °F, inside the schema’s −30…50 °C', () => {
    const limits = temperatureLimitsIn('fahrenheit', temperature);
    expect(limits).toEqual({ minimum: -22, maximum: 122 });
    fc.assert(
      fc.property(wholeNumbersWithin(limits), (f) => {
        const c = celsiusFrom('fahrenheit', f);
        expect(c).toBeGreaterThanOrEqual(temperature.minimum!);
        expect(c).toBeLessThanOrEqual(temperature.maximum!);
        expect(wholeTemperature('fahrenheit', c)).toBe(f);
      }),
      { numRuns: 500 },
    );
  });

  it('°C stays as typed', () => {
    expect(temperatureLimitsIn('celsius', temperature)).toEqual({ minimum: -30, maximum: 50 });
    expect(celsiusFrom('celsius', 21)).toBe(21);
  });
});

describe('formatting in the chosen unit (whole numbers)', () => {
  it('distances, sizes and areas', () => {
    expect(formatDistance('metres', 36.576)).toBe('37 m');
    expect(formatDistance('yards', 36.576)).toBe('40 yd');
    expect(formatSize('yards', { width: 36.576, length: 54.864 })).toBe('40 × 60 yd');
    expect(formatSize('metres', { width: 12, length: 20 })).toBe('12 × 20 m');
    expect(formatSize('metres', { width: 12, length: 20 }, '×')).toBe('12×20 m');
    // 1 m² is 1.196 yd²: 9 m² is 10.76 yd².
    expect(formatArea('yards', 9)).toBe('11 yd²');
    expect(formatArea('metres', 9)).toBe('9 m²');
  });

  it('temperatures, never "-0"', () => {
    expect(formatTemperature('fahrenheit', 30)).toBe('86 °F');
    expect(formatTemperature('celsius', 21.4)).toBe('21 °C');
    expect(formatTemperature('celsius', -0.2)).toBe('0 °C');
    expect(formatTemperature('fahrenheit', -30)).toBe('-22 °F');
  });

  it('the engine’s metric words in the reader’s units; unchanged in metres and °C', () => {
    const text =
      '12 × 20 m is too tight for 9 — keep-ball needs at least 4 m² a player and 9 m a side; above 30 °C rest.';
    expect(inUnitsText(text, { distance: 'metres', temperature: 'celsius' })).toBe(text);
    expect(inUnitsText(text, { distance: 'yards', temperature: 'fahrenheit' })).toBe(
      '13 × 22 yd is too tight for 9 — keep-ball needs at least 5 yd² a player and 10 yd a side; above 86 °F rest.',
    );
    // Minutes and words that start with m are left alone.
    expect(inUnitsText('5 min, 3 markers', { distance: 'yards', temperature: 'celsius' })).toBe(
      '5 min, 3 markers',
    );
  });
});

describe('whose units', () => {
  it('a person’s own choice wins where made; null follows the club', () => {
    const club = { distance: 'yards', temperature: 'fahrenheit' } as const;
    expect(effectiveUnits(club, { distance: null, temperature: null })).toEqual(club);
    expect(effectiveUnits(club, { distance: 'metres', temperature: null })).toEqual({
      distance: 'metres',
      temperature: 'fahrenheit',
    });
  });
});
