import { describe, expect, it } from 'vitest';
import { printable, printableContent } from './printable';

describe('printable', () => {
  it('keeps Latin-1 names and typographic punctuation as they are', () => {
    expect(printable('Zoë K. – 10:05–10:12 · 14 × 12 m “go”')).toBe('Zoë K. – 10:05–10:12 · 14 × 12 m “go”');
  });

  it('maps arrows and letters outside the embedded subset onto ones it has', () => {
    expect(printable('Area 14 m → 16 m')).toBe('Area 14 m to 16 m');
    expect(printable('Łucja Ś.')).toBe('Lucja S.');
    expect(printable('雪')).toBe('?');
  });

  it('rewrites text nodes of a content tree but never SVG markup', () => {
    const svg = '<svg><text>→</text></svg>';
    expect(printableContent({ stack: [{ text: ['a → b'] }, { svg }], ul: ['x → y'] })).toEqual({
      stack: [{ text: ['a to b'] }, { svg }],
      ul: ['x to y'],
    });
  });
});
