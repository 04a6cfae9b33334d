/**
 * The units a person reads and types distances and temperatures in. The engine, the API and the
 * database stay metric (metres, °C); these choices only change what people read and type.
 */
import '../i18n/localize';

export const DISTANCE_UNITS = ['metres', 'yards'] as const;
export const TEMPERATURE_UNITS = ['celsius', 'fahrenheit'] as const;

export type DistanceUnit = (typeof DISTANCE_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];

/** A complete choice: the club's setting, or what a person ends up reading. */
export interface Units {
  distance: DistanceUnit;
  temperature: TemperatureUnit;
}

/** A person's own choice; null follows the club's setting. */
export interface UnitOverride {
  distance: DistanceUnit | null;
  temperature: TemperatureUnit | null;
}

/** A new club's setting, and the choice of anyone whose club says nothing. */
export const DEFAULT_UNITS: Units = { distance: 'metres', temperature: 'celsius' };

/** Following the club in both. */
export const NO_OVERRIDE: UnitOverride = { distance: null, temperature: null };

/** What a person reads: their own choice where they made one, the club's elsewhere. */
export function effectiveUnits(club: Units, own: UnitOverride): Units {
  return { distance: own.distance ?? club.distance, temperature: own.temperature ?? club.temperature };
}

/** The choices in words, for lists and selects (getters: made on each read, in the reader's language). */
export const DISTANCE_UNIT_WORDS: Record<DistanceUnit, string> = {
  get metres() {
    return $localize`Metres`;
  },
  get yards() {
    return $localize`Yards`;
  },
};
export const TEMPERATURE_UNIT_WORDS: Record<TemperatureUnit, string> = {
  get celsius() {
    return $localize`Degrees Celsius (°C)`;
  },
  get fahrenheit() {
    return $localize`Degrees Fahrenheit (°F)`;
  },
};

export function isDistanceUnit(value: unknown): value is DistanceUnit {
  return (DISTANCE_UNITS as readonly unknown[]).includes(value);
}

export function isTemperatureUnit(value: unknown): value is TemperatureUnit {
  return (TEMPERATURE_UNITS as readonly unknown[]).includes(value);
}

/** The unit fields of a person in a club that kept the defaults and who chose nothing. */
export const NEW_CLUB_UNIT_FIELDS: { units: Units; clubUnits: Units; ownUnits: UnitOverride } = {
  units: DEFAULT_UNITS,
  clubUnits: DEFAULT_UNITS,
  ownUnits: NO_OVERRIDE,
};
