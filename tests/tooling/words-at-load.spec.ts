import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { wordsAtLoad, wordsAtLoadInProject } from './words-at-load';

describe('words made when a module loads', () => {
  it('finds a table of words at the top of a module and leaves words made on use alone', () => {
    const sample = [
      'const LABELS = { lead: $localize`Head of coaching` };',
      'export const NOTE = $localize`Made once`;',
      'export const WORDS = { get lead() { return $localize`Head of coaching`; } };',
      'export function note(n: number) { return $localize`${n}:count: players`; }',
      'export const later = () => $localize`Made on use`;',
      "class Card { title = 'x'; heading() { return $localize`Safety`; } }",
    ].join('\n');
    expect(wordsAtLoad(sample).map((w) => w.line)).toEqual([1, 2]);
  });

  it('finds none in the server, the engine or shared/: every reader gets their own language', () => {
    const root = fileURLToPath(new URL('../../', import.meta.url));
    expect(wordsAtLoadInProject(root).map((w) => `${w.file}:${w.line} ${w.text}`)).toEqual([]);
  });
});
