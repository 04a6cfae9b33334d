/** The one place that converts between the metric the engine keeps and the units people choose. */
import type { DistanceUnit, TemperatureUnit } from './units';

/** International yard (1959): exactly 0.9144 m. */
export const METRES_PER_YARD = 0.9144;

export function metresToYards(metres: number): number {
  return metres / METRES_PER_YARD;
}

export function yardsToMetres(yards: number): number {
  return yards * METRES_PER_YARD;
}

export function celsiusToFahrenheit(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

export function fahrenheitToCelsius(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** Metres as a number in `unit` (not rounded). */
export function distanceIn(unit: DistanceUnit, metres: number): number {
  return unit === 'yards' ? metresToYards(metres) : metres;
}

/**
 * A number typed in `unit`, in metres for a request: kept to the centimetre, which is finer than
 * half a yard, so a whole number of yards comes back as the same whole number.
 */
export function metresFrom(unit: DistanceUnit, value: number): number {
  return unit === 'yards' ? Math.round(yardsToMetres(value) * 100) / 100 : value;
}

/** °C as a number in `unit` (not rounded). */
export function temperatureIn(unit: TemperatureUnit, celsius: number): number {
  return unit === 'fahrenheit' ? celsiusToFahrenheit(celsius) : celsius;
}

/**
 * A temperature typed in `unit`, in °C for a request: kept to a tenth of a degree, finer than
 * half a degree Fahrenheit, so a whole °F comes back as the same whole °F.
 */
export function celsiusFrom(unit: TemperatureUnit, value: number): number {
  return unit === 'fahrenheit' ? Math.round(fahrenheitToCelsius(value) * 10) / 10 : value;
}

/** Numeric limits of a JSON Schema number, in the schema's own (metric) unit. */
export interface NumberLimits {
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
}

/**
 * A metric schema's limits (only its number keywords) in another unit: a lower bound rounds up
 * and an upper bound down to whole numbers, so every whole number inside converts back inside
 * the schema's own limits; exclusive bounds are converted as they are. In the schema's own unit
 * they come back unchanged.
 */
export function limitsIn(toUnit: (metric: number) => number, limits: NumberLimits): NumberLimits {
  const out: NumberLimits = {};
  if (limits.minimum !== undefined) out.minimum = Math.ceil(roundOff(toUnit(limits.minimum)));
  if (limits.maximum !== undefined) out.maximum = Math.floor(roundOff(toUnit(limits.maximum)));
  if (limits.exclusiveMinimum !== undefined) out.exclusiveMinimum = roundOff(toUnit(limits.exclusiveMinimum));
  if (limits.exclusiveMaximum !== undefined) out.exclusiveMaximum = roundOff(toUnit(limits.exclusiveMaximum));
  return out;
}

/** A schema's distance limits (metres) in `unit`. */
export function distanceLimitsIn(unit: DistanceUnit, limits: NumberLimits): NumberLimits {
  return limitsIn(unit === 'metres' ? same : metresToYards, limits);
}

/** A schema's temperature limits (°C) in `unit`. */
export function temperatureLimitsIn(unit: TemperatureUnit, limits: NumberLimits): NumberLimits {
  return limitsIn(unit === 'celsius' ? same : celsiusToFahrenheit, limits);
}

const same = (x: number) => x;

/** Drops floating-point dust (−22.000000000000004 → −22) before rounding to a whole number. */
function roundOff(x: number): number {
  return Math.round(x * 1e9) / 1e9;
}
