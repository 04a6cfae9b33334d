/**
 * The embedded font is the Latin subset of Roboto Condensed (its unicode-range as shipped by
 * @fontsource). Characters outside it would print as empty boxes, so text is mapped onto it.
 */
const RANGES: [number, number][] = [
  [0x0000, 0x00ff],
  [0x0131, 0x0131],
  [0x0152, 0x0153],
  [0x02bb, 0x02bc],
  [0x02c6, 0x02c6],
  [0x02da, 0x02da],
  [0x02dc, 0x02dc],
  [0x2000, 0x206f],
  [0x20ac, 0x20ac],
  [0x2122, 0x2122],
  [0x2191, 0x2191],
  [0x2193, 0x2193],
  [0x2212, 0x2212],
  [0x2215, 0x2215],
];

const REPLACEMENTS: Record<string, string> = {
  '→': 'to',
  '←': 'from',
  '≤': '<=',
  '≥': '>=',
  '✓': 'OK',
  ł: 'l',
  Ł: 'L',
  đ: 'd',
  Đ: 'D',
};

function printableChar(c: string): boolean {
  const code = c.codePointAt(0)!;
  return RANGES.some(([lo, hi]) => code >= lo && code <= hi);
}

/** The text with every character the card font can draw: known look-alikes, else the letter without its accent. */
export function printable(text: string): string {
  if ([...text].every(printableChar)) return text;
  let out = '';
  for (const c of text) {
    if (printableChar(c)) out += c;
    else if (REPLACEMENTS[c]) out += REPLACEMENTS[c];
    else {
      const base = [...c.normalize('NFKD')].filter(printableChar).join('');
      out += base || '?';
    }
  }
  return out;
}

const TEXT_KEYS = new Set(['text', 'ul', 'ol', 'stack', 'columns', 'table', 'body', 'content']);

/** Applies `printable` to every text node of a pdfmake content tree (never to SVG markup). */
export function printableContent<T>(node: T): T {
  if (typeof node === 'string') return printable(node) as T;
  if (Array.isArray(node)) return node.map((n) => printableContent(n)) as T;
  if (node && typeof node === 'object') {
    const out: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(node))
      out[key] = TEXT_KEYS.has(key) ? printableContent(value) : value;
    return out as T;
  }
  return node;
}
