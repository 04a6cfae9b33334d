/**
 * Published pitch and ball facts the product uses for presets (space choices in the plan
 * wizard) and reference checks. Each constant names its source.
 */
import type { AgeGroup } from './plan-request';
import type { Space } from './plan-request';

export const METRES_PER_YARD = 0.9144;

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
  space: Space;
}

const mid = (r: Range) => (r.min + r.max) / 2;

/**
 * The age group's format pitch (midpoint of the published ranges) and its half and third,
 * split along the length. From U13 the 11v11 pitch uses the middle of IFAB Law 1's ranges.
 */
export function spacePresetsFor(age: AgeGroup): SpacePreset[] {
  const standard = US_SOCCER_SMALL_SIDED_2016.find((s) => s.ages.includes(age));
  const full: Space = standard
    ? {
        width: round1(mid(standard.widthYd) * METRES_PER_YARD),
        length: round1(mid(standard.lengthYd) * METRES_PER_YARD),
      }
    : { width: mid(IFAB_LAW_1.goalLineM), length: mid(IFAB_LAW_1.touchlineM) };
  const format = standard?.format ?? '11v11';
  return [
    { id: 'full', label: `Full ${format} pitch`, space: full },
    {
      id: 'half',
      label: `Half a ${format} pitch`,
      space: { width: full.width, length: round1(full.length / 2) },
    },
    {
      id: 'third',
      label: `A third of a ${format} pitch`,
      space: { width: full.width, length: round1(full.length / 3) },
    },
  ];
}

function round1(x: number): number {
  return Math.round(x * 10) / 10;
}
