import '../../shared/i18n/localize';
import { CARD_FACES, CARD_FONT, EMOJI_FONT, faceCovers } from './fonts';

/**
 * pdfmake draws each piece of text in one font, and Roboto Condensed has no emoji and only some
 * scripts. So text is cut into runs, each drawn by the first face that has its characters (see
 * CARD_FACES in fonts.ts): names print whole, with accents, Greek, Cyrillic and emoji.
 */

/** Printed for a character no face has: an empty square from the emoji face, never "?". */
export const MISSING_MARK = '◻';

/** Words or signs printed for a few signs no face has. */
function replacement(grapheme: string): string | undefined {
  switch (grapheme) {
    case '→':
      return $localize`:printed on the card for a right arrow, as in 14 m to 16 m:to`;
    case '←':
      return $localize`:printed on the card for a left arrow, as in 16 m from 14 m:from`;
    case '≤':
      return '<=';
    case '≥':
      return '>=';
    case '✓':
      return $localize`:printed on the card for a tick mark:OK`;
    default:
      return undefined;
  }
}

/** Letters with no accent to drop, for the one-font SVG labels. */
const LOOKALIKES: Record<string, string> = { ł: 'l', Ł: 'L', đ: 'd', Đ: 'D' };

const graphemes = new Intl.Segmenter('en', { granularity: 'grapheme' });
const [latin] = CARD_FACES;
// Latin-1 and general punctuation are in the card's own face: most text needs no look-up at all.
const PLAIN = /^[ -\u00ff\u2000-\u206f\t\n\r]*$/;

export interface TextRun {
  text: string;
  /** The face's family; absent for the card's own font. */
  font?: string;
}

function faceFor(codePoints: number[]): string | undefined {
  return CARD_FACES.find((face) => codePoints.every((cp) => faceCovers(face, cp)))?.family;
}

/** One character as the user sees it (a grapheme), as a run in a face that has it. */
function runFor(grapheme: string): TextRun {
  const codePoints = [...grapheme].map((c) => c.codePointAt(0)!);
  const whole = faceFor(codePoints);
  if (whole) return { text: grapheme, font: whole };
  // An emoji sequence or a letter with a mark no single face has: its first character alone.
  const first = faceFor(codePoints.slice(0, 1));
  if (first && first !== CARD_FONT) return { text: String.fromCodePoint(codePoints[0]!), font: first };
  const replaced = replacement(grapheme);
  if (replaced) return { text: replaced, font: CARD_FONT };
  const base = [...grapheme.normalize('NFKD')].filter((c) => faceCovers(latin!, c.codePointAt(0)!)).join('');
  if (base) return { text: base, font: CARD_FONT };
  return { text: MISSING_MARK, font: EMOJI_FONT };
}

/** The text cut into runs of one face each (one run without a font when the card's own has it all). */
export function cardRuns(text: string): TextRun[] {
  if (PLAIN.test(text)) return [{ text }];
  const runs: TextRun[] = [];
  for (const { segment } of graphemes.segment(text)) {
    const run = runFor(segment);
    const last = runs.at(-1);
    if (last && last.font === run.font) last.text += run.text;
    else runs.push(run);
  }
  return runs.map((run) => (run.font === CARD_FONT ? { text: run.text } : run));
}

/** For SVG labels, drawn in the card's own font only: look-alikes, else the letter without its accent. */
export function printable(text: string): string {
  return cardRuns(text)
    .map((run) => {
      if (!run.font) return run.text;
      return [...graphemes.segment(run.text)]
        .map(({ segment }) => {
          const base = [...segment.normalize('NFKD')].filter((c) => faceCovers(latin!, c.codePointAt(0)!));
          return LOOKALIKES[segment] ?? (base.join('') || '·');
        })
        .join('');
    })
    .join('');
}

const CONTAINER_KEYS = new Set(['ul', 'ol', 'stack', 'columns', 'table', 'body', 'content']);
type Node = Record<string, unknown>;
const isNode = (value: unknown): value is Node =>
  !!value && typeof value === 'object' && !Array.isArray(value);

/** Inline text (a `text` value): a string becomes runs; styled pieces keep their style on each run. */
function inlineText(value: unknown): unknown {
  if (typeof value === 'string') {
    const runs = cardRuns(value);
    return runs.length === 1 && !runs[0]!.font ? value : runs;
  }
  if (!Array.isArray(value)) return value;
  return value.flatMap((piece: unknown) => {
    if (typeof piece === 'string') return cardRuns(piece);
    if (isNode(piece) && typeof piece['text'] === 'string') {
      return cardRuns(piece['text']).map((run) => ({ ...piece, ...run }));
    }
    if (isNode(piece) && Array.isArray(piece['text'])) return [{ ...piece, text: inlineText(piece['text']) }];
    return [piece];
  });
}

/** Gives every text node of a pdfmake content tree the faces its characters need (never SVG markup). */
export function printableContent<T>(node: T): T {
  if (typeof node === 'string') {
    const runs = cardRuns(node);
    return (runs.length === 1 && !runs[0]!.font ? node : { text: runs }) as T;
  }
  if (Array.isArray(node)) return node.map((n) => printableContent(n)) as T;
  if (isNode(node)) {
    const out: Node = {};
    for (const [key, value] of Object.entries(node)) {
      if (key === 'text') out[key] = inlineText(value);
      else out[key] = CONTAINER_KEYS.has(key) ? printableContent(value) : value;
    }
    return out as T;
  }
  return node;
}
