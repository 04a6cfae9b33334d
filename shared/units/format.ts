/** The one place that writes distances, sizes, areas and temperatures for people. */
import '../i18n/localize';
import { distanceIn, temperatureIn } from './convert';
import type { DistanceUnit, TemperatureUnit } from './units';

/** The short sign after a number: "m" or "yd". */
export function distanceSymbol(unit: DistanceUnit): 'm' | 'yd' {
  return unit === 'yards' ? 'yd' : 'm';
}

/** The unit in a sentence: "metres" or "yards". */
export function distanceUnitName(unit: DistanceUnit): string {
  return unit === 'yards'
    ? $localize`:distance unit inside a sentence, e.g. Space (yards):yards`
    : $localize`:distance unit inside a sentence, e.g. Space (metres):metres`;
}

/** "°C" or "°F". */
export function temperatureSymbol(unit: TemperatureUnit): '°C' | '°F' {
  return unit === 'fahrenheit' ? '°F' : '°C';
}

/** Metres as a whole number in `unit` (40 yd for 36.576 m). */
export function wholeDistance(unit: DistanceUnit, metres: number): number {
  return whole(distanceIn(unit, metres));
}

/** °C as a whole number in `unit`. */
export function wholeTemperature(unit: TemperatureUnit, celsius: number): number {
  return whole(temperatureIn(unit, celsius));
}

/** "40 yd" / "37 m". */
export function formatDistance(unit: DistanceUnit, metres: number): string {
  return `${wholeDistance(unit, metres)} ${distanceSymbol(unit)}`;
}

/** "40 × 60 yd": an area's width by its length, whole numbers in `unit`. */
export function formatSize(unit: DistanceUnit, size: { width: number; length: number }, by = ' × '): string {
  return `${wholeDistance(unit, size.width)}${by}${wholeDistance(unit, size.length)} ${distanceSymbol(unit)}`;
}

/** "40 by 60 yards", for sentences read aloud. */
export function sizeInWords(unit: DistanceUnit, size: { width: number; length: number }): string {
  const width = wholeDistance(unit, size.width);
  const length = wholeDistance(unit, size.length);
  return unit === 'yards'
    ? $localize`:an area's width by its length, read aloud:${width}:width: by ${length}:length: yards`
    : $localize`:an area's width by its length, read aloud:${width}:width: by ${length}:length: metres`;
}

/** Square metres as "9 m²" / "11 yd²" (whole numbers in `unit`). */
export function formatArea(unit: DistanceUnit, squareMetres: number): string {
  const perSide = distanceIn(unit, 1);
  return `${whole(squareMetres * perSide * perSide)} ${distanceSymbol(unit)}²`;
}

/** "21 °C" / "70 °F". */
export function formatTemperature(unit: TemperatureUnit, celsius: number): string {
  return `${wholeTemperature(unit, celsius)} ${temperatureSymbol(unit)}`;
}

/** Rounds half away from zero and never writes "-0". */
function whole(x: number): number {
  const n = Math.sign(x) * Math.round(Math.abs(x));
  return n === 0 ? 0 : n;
}

const NUMBER = String.raw`(-?\d+(?:\.\d+)?)`;
const SIZE_IN_METRES = new RegExp(String.raw`${NUMBER} × ${NUMBER} m(?![²\w])`, 'g');
const AREA_IN_METRES = new RegExp(String.raw`${NUMBER} m²`, 'g');
const DISTANCE_IN_METRES = new RegExp(String.raw`${NUMBER} m(?![²\w])`, 'g');
const TEMPERATURE_IN_CELSIUS = new RegExp(String.raw`${NUMBER} ?°C\b`, 'g');

/**
 * Text the engine wrote in metres and °C ("12 × 20 m is too tight … 4 m² a player", "above
 * 30 °C") in the reader's units, whole numbers; unchanged for metres and °C. The engine stays
 * metric and words its own messages; this is where people's units are put into them.
 */
export function inUnitsText(
  text: string,
  units: { distance: DistanceUnit; temperature: TemperatureUnit },
): string {
  let out = text;
  if (units.distance !== 'metres') {
    out = out
      .replace(SIZE_IN_METRES, (_, w: string, l: string) =>
        formatSize(units.distance, { width: Number(w), length: Number(l) }),
      )
      .replace(AREA_IN_METRES, (_, a: string) => formatArea(units.distance, Number(a)))
      .replace(DISTANCE_IN_METRES, (_, d: string) => formatDistance(units.distance, Number(d)));
  }
  if (units.temperature !== 'celsius') {
    out = out.replace(TEMPERATURE_IN_CELSIUS, (_, t: string) =>
      formatTemperature(units.temperature, Number(t)),
    );
  }
  return out;
}

/**
 * Every text inside a plan-shaped value (warnings, notes, descriptions) through `inUnitsText`;
 * numbers, and everything when the units are metres and °C, are left as they are.
 */
export function inUnitsDeep<T>(value: T, units: { distance: DistanceUnit; temperature: TemperatureUnit }): T {
  if (units.distance === 'metres' && units.temperature === 'celsius') return value;
  const walk = (v: unknown): unknown => {
    if (typeof v === 'string') return inUnitsText(v, units);
    if (Array.isArray(v)) return v.map(walk);
    if (v && typeof v === 'object')
      return Object.fromEntries(Object.entries(v).map(([k, x]) => [k, walk(x)]));
    return v;
  };
  return walk(value) as T;
}
