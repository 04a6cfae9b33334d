import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type { TFontDictionary } from 'pdfmake/interfaces';
import { woffToSfnt } from './woff-to-sfnt';

/** Family name the card uses in pdfmake styles and in SVG `font-family`. */
export const CARD_FONT = 'RobotoCondensed';

// The WOFF files ship inside the installed package, so the card never fetches fonts at run time.
const fontDir = join(
  dirname(createRequire(import.meta.url).resolve('@fontsource/roboto-condensed/package.json')),
  'files',
);

// Unpacked once per process from the shipped WOFF files (see woff-to-sfnt.ts for why).
const file = (weight: number, style: 'normal' | 'italic') =>
  woffToSfnt(readFileSync(join(fontDir, `roboto-condensed-latin-${weight}-${style}.woff`)));

/** pdfmake font dictionary with Roboto Condensed embedded (subset into each PDF). */
export const cardFonts: TFontDictionary = {
  [CARD_FONT]: {
    normal: file(400, 'normal'),
    bold: file(700, 'normal'),
    italics: file(400, 'italic'),
    bolditalics: file(700, 'italic'),
  },
};
