/** Source: WCAG 2.1, success criterion 1.4.3 (contrast of at least 4.5:1), and its relative-luminance formula. */
import { describe, expect, it } from 'vitest';
import { POSITION_STYLE } from './activity-words';

function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const f = (c: number) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  return 0.2126 * f(r) + 0.7152 * f(g) + 0.0722 * f(b);
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe('diagram colours', () => {
  it('every player circle’s number reads at 4.5:1 or better against its fill', () => {
    for (const [role, style] of Object.entries(POSITION_STYLE)) {
      expect(contrast(style.fill, style.text), role).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('white on black is 21:1 and equal colours 1:1, as the formula gives', () => {
    expect(contrast('#ffffff', '#000000')).toBeCloseTo(21, 5);
    expect(contrast('#777777', '#777777')).toBe(1);
  });
});
