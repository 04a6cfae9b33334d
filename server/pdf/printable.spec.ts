import { describe, expect, it } from 'vitest';
import { printable, printableContent } from './printable';

describe('printable', () => {
  it('keeps Latin-1 names and typographic punctuation as they are', () => {
    expect(printable('Zoë K. – 10:05–10:12 · 14 × 12 m “go”')).toBe('Zoë K. – 10:05–10:12 · 14 × 12 m “go”');
  });

  it('in the one-font SVG labels, maps arrows and letters outside the Latin face onto ones it has', () => {
    expect(printable('Area 14 m → 16 m')).toBe('Area 14 m to 16 m');
    expect(printable('Łucja Ś.')).toBe('Lucja S.');
    expect(printable('雪')).toBe('·');
  });

  it('gives text nodes of a content tree the faces they need but never touches SVG markup', () => {
    const svg = '<svg><text>→ 🦊</text></svg>';
    expect(printableContent({ stack: [{ text: ['a → b'] }, { svg }], ul: ['x 🦊'] })).toEqual({
      stack: [{ text: [{ text: 'a to b' }] }, { svg }],
      ul: [{ text: [{ text: 'x ' }, { text: '🦊', font: 'NotoEmoji' }] }],
    });
  });
});
