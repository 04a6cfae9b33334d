import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type { TFontDictionary } from 'pdfmake/interfaces';
import { renamePostscript } from './font-name';
import { woffToSfnt } from './woff-to-sfnt';

/** Family name the card uses in pdfmake styles and in SVG `font-family`. */
export const CARD_FONT = 'RobotoCondensed';

// The WOFF files and their unicode-range lists ship inside the installed packages, so the card
// never fetches fonts at run time.
const resolve = createRequire(import.meta.url).resolve;
const robotoDir = dirname(resolve('@fontsource/roboto-condensed/package.json'));
const emojiDir = dirname(resolve('@fontsource/noto-emoji/package.json'));

type Style = 'normal' | 'bold' | 'italics' | 'bolditalics';

/** A font the card can draw a character with: its pdfmake family and the code points it covers. */
interface CardFace {
  family: string;
  ranges: [number, number][];
  files: Record<Style, string>;
}

/** The unicode-range of each @font-face in a Fontsource CSS file, by the file it names. */
function unicodeRanges(css: string): Map<string, [number, number][]> {
  const out = new Map<string, [number, number][]>();
  for (const face of css.split('@font-face').slice(1)) {
    const file = /url\(\.\/files\/([^)]+?)\.woff2\)/.exec(face)?.[1];
    const range = /unicode-range:\s*([^;]+);/.exec(face)?.[1];
    if (!file || !range) continue;
    out.set(
      file,
      range.split(',').map((part) => {
        const [lo, hi] = part.trim().replace(/^U\+/i, '').split('-');
        return [parseInt(lo!, 16), parseInt(hi ?? lo!, 16)];
      }),
    );
  }
  return out;
}

// Roboto Condensed comes in subsets (Latin first: most names need nothing else), each its own face.
const ROBOTO_SUBSETS = ['latin', 'latin-ext', 'greek', 'greek-ext', 'cyrillic', 'cyrillic-ext', 'vietnamese'];
const robotoRanges = unicodeRanges(readFileSync(join(robotoDir, '400.css'), 'utf8'));
const robotoFaces: CardFace[] = ROBOTO_SUBSETS.map((subset) => {
  const file = (weight: number, style: string) =>
    join(robotoDir, 'files', `roboto-condensed-${subset}-${weight}-${style}.woff`);
  return {
    family: subset === 'latin' ? CARD_FONT : `${CARD_FONT}-${subset}`,
    ranges: robotoRanges.get(`roboto-condensed-${subset}-400-normal`) ?? [],
    files: {
      normal: file(400, 'normal'),
      bold: file(700, 'normal'),
      italics: file(400, 'italic'),
      bolditalics: file(700, 'italic'),
    },
  };
});

// Noto Emoji (black and white, so it prints well) in one file; its CSS splits the same glyphs into
// ranges for browsers, whose union is what the whole file covers.
const emojiRanges = [...unicodeRanges(readFileSync(join(emojiDir, 'index.css'), 'utf8')).values()].flat();
const emojiFile = (weight: number) => join(emojiDir, 'files', `noto-emoji-emoji-${weight}-normal.woff`);
const emojiFace: CardFace = {
  family: 'NotoEmoji',
  ranges: emojiRanges,
  files: {
    normal: emojiFile(400),
    bold: emojiFile(700),
    italics: emojiFile(400),
    bolditalics: emojiFile(700),
  },
};

/** Every face in the order a character is looked up: the card's own font first. */
export const CARD_FACES: readonly CardFace[] = [...robotoFaces, emojiFace];

/** The family of the emoji face, which also draws the marker for a character no face has. */
export const EMOJI_FONT = emojiFace.family;

export function faceCovers(face: CardFace, codePoint: number): boolean {
  return face.ranges.some(([lo, hi]) => codePoint >= lo && codePoint <= hi);
}

// Unpacked once per process, the first time a card is printed (see woff-to-sfnt.ts for why);
// every face but the first gets a PostScript name of its own (see font-name.ts).
const unpacked = new Map<string, Buffer>();
function sfnt(path: string, index: number): Buffer {
  let font = unpacked.get(path);
  if (!font) {
    font = woffToSfnt(readFileSync(path));
    if (index > 0) font = renamePostscript(font, `-${String.fromCharCode(64 + index)}`);
    unpacked.set(path, font);
  }
  return font;
}

/** pdfmake font dictionary: every face, embedded as a subset of the glyphs each PDF uses. */
export const cardFonts: TFontDictionary = Object.fromEntries(
  CARD_FACES.map((face, index) => {
    const styles = {};
    for (const style of ['normal', 'bold', 'italics', 'bolditalics'] as const) {
      Object.defineProperty(styles, style, { enumerable: true, get: () => sfnt(face.files[style], index) });
    }
    return [face.family, styles];
  }),
);
