/**
 * Source: US Soccer Player Development Initiatives (2016), small-sided standards —
 * U6–U8 4v4 on 25–35 × 15–25 yd, U9–U10 7v7 on 55–65 × 35–45 yd, U11–U12 9v9 on 70–80 × 45–55 yd;
 * ball size 3 for U6–U8, 4 for U9–U12, 5 from U13.
 */
import { describe, expect, it } from 'vitest';
import {
  ballSizeFor,
  METRES_PER_YARD,
  spacePresetsFor,
  US_SOCCER_SMALL_SIDED_2016,
} from '../../shared/pitch/pitch-standards';
import { defaultRuleSet } from '../../engine';

describe('US Soccer Player Development Initiatives (2016) small-sided standards', () => {
  it('the shared table holds the published formats and field sizes', () => {
    expect(US_SOCCER_SMALL_SIDED_2016.map((s) => [s.ages[0], s.format, s.lengthYd, s.widthYd])).toEqual([
      ['U6', '4v4', { min: 25, max: 35 }, { min: 15, max: 25 }],
      ['U9', '7v7', { min: 55, max: 65 }, { min: 35, max: 45 }],
      ['U11', '9v9', { min: 70, max: 80 }, { min: 45, max: 55 }],
    ]);
  });

  it('ball size: 3 for U6–U8, 4 for U9–U12, 5 from U13', () => {
    expect(['U6', 'U7', 'U8'].map((a) => ballSizeFor(a as 'U6'))).toEqual([3, 3, 3]);
    expect(['U9', 'U10', 'U11', 'U12'].map((a) => ballSizeFor(a as 'U9'))).toEqual([4, 4, 4, 4]);
    expect(['U13', 'U16', 'adult'].map((a) => ballSizeFor(a as 'U13'))).toEqual([5, 5, 5]);
  });

  it('presets in yards: the U9–U10 7v7 pitch at the middle of 55–65 × 35–45 yd, its half and third, whole yards', () => {
    const [full, half, third] = spacePresetsFor('U10', 'yards');
    expect([full.size, half.size, third.size]).toEqual([
      { width: 40, length: 60 },
      { width: 40, length: 30 },
      { width: 40, length: 20 },
    ]);
    expect(full.source).toMatch(/US Soccer Player Development Initiatives \(2016\)/);
    // The request gets the same pitch in metres, which reads back as the same whole yards.
    expect(full.space.width / METRES_PER_YARD).toBeCloseTo(40, 1);
    expect(full.space.length / METRES_PER_YARD).toBeCloseTo(60, 1);
  });

  it('presets in metres: the same 40 × 60 yd pitch in whole metres (36.6 × 54.9 m), half and third from it', () => {
    const [full, half, third] = spacePresetsFor('U10', 'metres');
    expect([full.size, half.size, third.size]).toEqual([
      { width: 37, length: 55 },
      { width: 37, length: 27 },
      { width: 37, length: 18 },
    ]);
    expect(full.space).toEqual(full.size);
  });

  it('U6–U8 and U11–U12 presets in yards are the middle of their published ranges', () => {
    expect(spacePresetsFor('U7', 'yards')[0].size).toEqual({ width: 20, length: 30 });
    expect(spacePresetsFor('U12', 'yards')[0].size).toEqual({ width: 50, length: 75 });
  });

  it("the rule set's U6–U8 small-sided game area sits inside the 4v4 field range", () => {
    const area = defaultRuleSet.parameters.areas['small-sided-game']['U6-U8'];
    const yd = (m: number) => m / METRES_PER_YARD;
    expect(yd(area.width)).toBeGreaterThanOrEqual(15);
    expect(yd(area.width)).toBeLessThanOrEqual(25);
    expect(yd(area.length)).toBeGreaterThanOrEqual(25);
    expect(yd(area.length)).toBeLessThanOrEqual(35);
  });
});

describe('US Soccer Player Development Initiatives (2016): game formats in the rule set', () => {
  it('players a side: 4 for U6–U8 (no goalkeepers), 7 for U9–U10, 9 for U11–U12, goalkeepers from U9', () => {
    const formats = defaultRuleSet.parameters.gameFormats;
    expect([
      formats['U6-U8'].maxPerSide,
      formats['U9-U10'].maxPerSide,
      formats['U11-U12'].maxPerSide,
    ]).toEqual([4, 7, 9]);
    expect(formats['U6-U8'].goalkeepers).toBe(false);
    expect(formats['U9-U10'].goalkeepers && formats['U11-U12'].goalkeepers).toBe(true);
    // The shared table says the same formats.
    expect(US_SOCCER_SMALL_SIDED_2016.map((s) => Number(s.format.split('v')[0]))).toEqual([4, 7, 9]);
  });

  it('the U9–U10 and U11–U12 game areas for a full side sit inside the published field sizes', () => {
    const yd = (m: number) => m / METRES_PER_YARD;
    const areas = defaultRuleSet.parameters.areas['small-sided-game'];
    const u10 = areas['U9-U10'];
    expect(u10.forPlayers).toBe(14); // 7v7
    expect(yd(u10.width)).toBeGreaterThanOrEqual(35);
    expect(yd(u10.width)).toBeLessThanOrEqual(45);
    expect(yd(u10.length)).toBeGreaterThanOrEqual(55);
    expect(yd(u10.length)).toBeLessThanOrEqual(65);
    const u12 = areas['U11-U12'];
    expect(u12.forPlayers).toBe(18); // 9v9
    expect(yd(u12.width)).toBeGreaterThanOrEqual(45);
    expect(yd(u12.width)).toBeLessThanOrEqual(55);
    expect(yd(u12.length)).toBeGreaterThanOrEqual(70);
    expect(yd(u12.length)).toBeLessThanOrEqual(80);
  });
});
