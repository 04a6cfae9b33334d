/**
 * Stored metric numbers shown and typed in a person's units, for fields that edit them in place
 * (the club rules' tables): the stored value stays metric; the field shows it to a tenth in the
 * person's unit and converts what they type back, to the hundredth, which is fine enough that any
 * number typed to a tenth shows again as typed.
 */
import { celsiusToFahrenheit, distanceIn, fahrenheitToCelsius, yardsToMetres } from './convert';
import { distanceSymbol, temperatureSymbol } from './format';
import type { Units } from './units';

/** What a stored metric number measures: metres, square metres or °C. */
export type Measure = 'distance' | 'area' | 'temperature';

/** Whether the person reads this measure in its metric unit (then nothing is converted). */
export function isMetricFor(measure: Measure, units: Units): boolean {
  return measure === 'temperature' ? units.temperature === 'celsius' : units.distance === 'metres';
}

/** "m", "yd", "m²", "yd²", "°C" or "°F". */
export function measureSymbol(measure: Measure, units: Units): string {
  if (measure === 'temperature') return temperatureSymbol(units.temperature);
  const symbol = distanceSymbol(units.distance);
  return measure === 'area' ? `${symbol}²` : symbol;
}

/** A stored metric number in the person's unit, to a tenth; unchanged when they read metric. */
export function measureIn(measure: Measure, units: Units, metric: number): number {
  if (isMetricFor(measure, units)) return metric;
  const converted =
    measure === 'temperature'
      ? celsiusToFahrenheit(metric)
      : measure === 'area'
        ? metric * distanceIn(units.distance, 1) ** 2
        : distanceIn(units.distance, metric);
  return tenth(converted);
}

/** A number typed in the person's unit, metric for storing (to the hundredth); unchanged when metric. */
export function metricFrom(measure: Measure, units: Units, typed: number): number {
  if (isMetricFor(measure, units)) return typed;
  const metric =
    measure === 'temperature'
      ? fahrenheitToCelsius(typed)
      : measure === 'area'
        ? typed * yardsToMetres(1) ** 2
        : yardsToMetres(typed);
  return hundredth(metric);
}

function tenth(x: number): number {
  const n = Math.round(x * 10) / 10;
  return n === 0 ? 0 : n;
}

function hundredth(x: number): number {
  const n = Math.round(x * 100) / 100;
  return n === 0 ? 0 : n;
}

/** What the rule set's measured numbers measure, by their place; counts and minutes measure nothing. */
const RULE_SET_MEASURES: [place: RegExp, measure: Measure][] = [
  [/^\/parameters\/areas\/[^/]+\/[^/]+\/(width|length|minWidth|maxWidth|step)$/, 'distance'],
  [/^\/parameters\/keepBallLimits\/minM2PerPlayer$/, 'area'],
  [/^\/parameters\/keepBallLimits\/minSideM$/, 'distance'],
  [/^\/parameters\/cautions\/(heatC|coldC)$/, 'temperature'],
];

/** The measure of the rule-set number at a JSON pointer, or null for a count or minutes. */
export function ruleSetMeasureAt(pointer: string): Measure | null {
  return RULE_SET_MEASURES.find(([place]) => place.test(pointer))?.[1] ?? null;
}
