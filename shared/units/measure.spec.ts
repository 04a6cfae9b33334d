import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { measureIn, measureSymbol, metricFrom, type Measure } from './measure';
import type { Units } from './units';

const YARDS_F: Units = { distance: 'yards', temperature: 'fahrenheit' };
const METRIC: Units = { distance: 'metres', temperature: 'celsius' };

/** Numbers typed to a tenth (whole numbers included), over more than any rule table holds. */
const tenths = (low: number, high: number) =>
  fc.integer({ min: low * 10, max: high * 10 }).map((n) => n / 10);

describe('stored metric numbers edited in a person’s units', () => {
  const cases: [Measure, fc.Arbitrary<number>][] = [
    ['distance', tenths(0, 500)],
    ['area', tenths(0, 2000)],
    ['temperature', tenths(-60, 150)],
  ];
  for (const [measure, typed] of cases) {
    it(`${measure}: a number typed to a tenth in yards/°F is stored metric and shows again as typed`, () => {
      fc.assert(
        fc.property(typed, (value) => {
          const stored = metricFrom(measure, YARDS_F, value);
          expect(measureIn(measure, YARDS_F, stored)).toBe(value);
        }),
        { numRuns: 2000 },
      );
    });

    it(`${measure}: in metres and °C the number is stored and shown exactly as it is`, () => {
      fc.assert(
        fc.property(fc.double({ min: -100, max: 1000, noNaN: true }), (value) => {
          expect(metricFrom(measure, METRIC, value)).toBe(value);
          expect(measureIn(measure, METRIC, value)).toBe(value);
        }),
      );
    });
  }

  it('known values: 12 m is 13.1 yd, 4 m² is 4.8 yd², 30 °C is 86 °F, and back', () => {
    expect(measureIn('distance', YARDS_F, 12)).toBe(13.1);
    expect(measureIn('area', YARDS_F, 4)).toBe(4.8);
    expect(measureIn('temperature', YARDS_F, 30)).toBe(86);
    expect(measureIn('temperature', YARDS_F, -2)).toBe(28.4);
    // 40 yd is 36.576 m; 5 yd² is 4.18 m²; 85 °F is 29.44 °C.
    expect(metricFrom('distance', YARDS_F, 40)).toBe(36.58);
    expect(metricFrom('area', YARDS_F, 5)).toBe(4.18);
    expect(metricFrom('temperature', YARDS_F, 85)).toBe(29.44);
  });

  it('labels each field with its unit', () => {
    expect(['distance', 'area', 'temperature'].map((m) => measureSymbol(m as Measure, YARDS_F))).toEqual([
      'yd',
      'yd²',
      '°F',
    ]);
    expect(['distance', 'area', 'temperature'].map((m) => measureSymbol(m as Measure, METRIC))).toEqual([
      'm',
      'm²',
      '°C',
    ]);
  });
});
