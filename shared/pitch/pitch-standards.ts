/**
 * Published pitch and ball facts the product uses for presets (space choices in the plan
 * wizard) and reference checks. Each constant names its source.
 */
import { metresFrom, METRES_PER_YARD, type DistanceUnit } from '../units';
import type { AgeGroup, Space } from '../types/plan-request';

export { METRES_PER_YARD };

export interface Range {
  min: number;
  max: number;
}

/** IFAB Laws of the Game, Law 1 (The Field of Play): full-size pitch geometry, metres. */
export const IFAB_LAW_1 = {
  touchlineM: { min: 90, max: 120 },
  goalLineM: { min: 45, max: 90 },
  goalWidthM: 7.32,
  goalHeightM: 2.44,
  centreCircleRadiusM: 9.15,
  penaltyAreaDepthM: 16.5,
} as const;

/**
 * IFAB Laws of the Game, Law 1, the same pitch in the Law's yards (touchline 100–130 yd, goal
 * line 50–100 yd): a yard club's 11v11 preset is taken from these, not converted from metres.
 */
export const IFAB_LAW_1_YARDS = {
  touchlineYd: { min: 100, max: 130 },
  goalLineYd: { min: 50, max: 100 },
} as const;

export interface SmallSidedStandard {
  ages: AgeGroup[];
  format: string;
  lengthYd: Range;
  widthYd: Range;
  ballSize: 3 | 4 | 5;
}

/** US Soccer Player Development Initiatives (2016): small-sided formats, field sizes and ball sizes. */
export const US_SOCCER_SMALL_SIDED_2016: SmallSidedStandard[] = [
  {
    ages: ['U6', 'U7', 'U8'],
    format: '4v4',
    lengthYd: { min: 25, max: 35 },
    widthYd: { min: 15, max: 25 },
    ballSize: 3,
  },
  {
    ages: ['U9', 'U10'],
    format: '7v7',
    lengthYd: { min: 55, max: 65 },
    widthYd: { min: 35, max: 45 },
    ballSize: 4,
  },
  {
    ages: ['U11', 'U12'],
    format: '9v9',
    lengthYd: { min: 70, max: 80 },
    widthYd: { min: 45, max: 55 },
    ballSize: 4,
  },
];

/** Ball size by age group: 3 for U6–U8, 4 for U9–U12, 5 from U13 (US Soccer, 2016). */
export function ballSizeFor(age: AgeGroup): 3 | 4 | 5 {
  return US_SOCCER_SMALL_SIDED_2016.find((s) => s.ages.includes(age))?.ballSize ?? 5;
}

export interface SpacePreset {
  id: 'full' | 'half' | 'third';
  label: string;
  /** Whole numbers in `unit`, as the coach reads and types them. */
  size: Space;
  unit: DistanceUnit;
  /** The same size in metres, for the plan request. */
  space: Space;
  /** Where the full pitch's numbers come from, said beside them. */
  source: string;
}

const mid = (r: Range) => (r.min + r.max) / 2;

/** The published standards the presets come from, as a coach reads them beside the numbers. */
export const PRESET_SOURCES = {
  smallSided: 'US Soccer Player Development Initiatives (2016), small-sided field sizes',
  law1: 'IFAB Laws of the Game, Law 1',
} as const;

/**
 * The age group's format pitch (the middle of the published ranges) and its half and third, split
 * along the length, as whole numbers in `unit`. Each unit starts from the standard's own numbers
 * where it has them: the small-sided fields are published in yards (metres are converted from
 * them), the 11v11 pitch in both (IFAB Law 1).
 */
export function spacePresetsFor(age: AgeGroup, unit: DistanceUnit = 'metres'): SpacePreset[] {
  const standard = US_SOCCER_SMALL_SIDED_2016.find((s) => s.ages.includes(age));
  // The full pitch in the chosen unit, not yet rounded: yards straight from a yard standard.
  const full: Space = standard
    ? {
        width: inUnit(unit, mid(standard.widthYd)),
        length: inUnit(unit, mid(standard.lengthYd)),
      }
    : unit === 'yards'
      ? { width: mid(IFAB_LAW_1_YARDS.goalLineYd), length: mid(IFAB_LAW_1_YARDS.touchlineYd) }
      : { width: mid(IFAB_LAW_1.goalLineM), length: mid(IFAB_LAW_1.touchlineM) };
  const format = standard?.format ?? '11v11';
  const source = standard ? PRESET_SOURCES.smallSided : PRESET_SOURCES.law1;
  const preset = (id: SpacePreset['id'], label: string, parts: number): SpacePreset => {
    const size = { width: Math.round(full.width), length: Math.round(full.length / parts) };
    return {
      id,
      label,
      size,
      unit,
      space: { width: metresFrom(unit, size.width), length: metresFrom(unit, size.length) },
      source,
    };
  };
  return [
    preset('full', `Full ${format} pitch`, 1),
    preset('half', `Half a ${format} pitch`, 2),
    preset('third', `A third of a ${format} pitch`, 3),
  ];
}

/** Yards of a yard standard in `unit` (metres converted exactly, rounded by the caller). */
function inUnit(unit: DistanceUnit, yards: number): number {
  return unit === 'yards' ? yards : yards * METRES_PER_YARD;
}
