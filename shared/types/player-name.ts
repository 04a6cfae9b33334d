/**
 * The one place that decides what a player's name on a team looks like and when two names are
 * the same. The server's "Add a player", player edits and CSV import go through it
 * (server/services/player-names.ts), and the import preview checks the names a coach types with it.
 */

const graphemes = new Intl.Segmenter(undefined, { granularity: 'grapheme' });
const LETTER = /\p{L}/u;

/** A name as stored: NFC, single spaces, no space at either end. */
export function cleanName(name: string): string {
  return name.normalize('NFC').replace(/\s+/gu, ' ').trim();
}

/**
 * Two names are the same player name when their letters are: case, spacing, full stops and an
 * added emoji do not tell two children apart when the coach calls them.
 */
export function nameKey(name: string): string {
  const lower = cleanName(name).toLocaleLowerCase('und');
  return lower.replace(/[^\p{L}\p{M}]/gu, '') || lower;
}

/** The names already on a team (or earlier in a file), compared as `nameKey` does. */
export class TakenNames {
  private readonly keys = new Map<string, string>();

  constructor(names: Iterable<string> = []) {
    for (const name of names) this.add(name);
  }

  has(name: string): boolean {
    return this.keys.has(nameKey(name));
  }

  add(name: string): void {
    this.keys.set(nameKey(name), cleanName(name));
  }
}

function hasLetter(word: string): boolean {
  return LETTER.test(word);
}

/** The first `letters` letters of a word, cut between whole characters (accents and emoji kept). */
function leadingLetters(word: string, letters: number): string {
  let out = '';
  let count = 0;
  for (const { segment } of graphemes.segment(word.replace(/\.$/, ''))) {
    if (count >= letters) break;
    out += count === 0 ? segment.toLocaleUpperCase() : segment;
    if (hasLetter(segment)) count++;
  }
  return out;
}

function letterCount(word: string): number {
  return [...graphemes.segment(word)].filter(({ segment }) => hasLetter(segment)).length;
}

interface NameParts {
  words: string[];
  /** Index of the first name and of the family name among `words` (-1 when there is none). */
  first: number;
  family: number;
}

function parts(raw: string): NameParts {
  const words = cleanName(raw).split(' ').filter(Boolean);
  const first = words.findIndex(hasLetter);
  let family = -1;
  for (let i = words.length - 1; i > first; i--) {
    if (hasLetter(words[i]!)) {
      family = i;
      break;
    }
  }
  return { words, first, family };
}

/**
 * Keeps what a squad list needs: the first name and the first `letters` letters of the family
 * name ("Maya Okafor" → "Maya O."; with 2, "Maya Ok."). Middle names are left out; words with no
 * letters (an emoji the coach added) stay where they are. Works on whole characters, so "Kai
 * Müller 🦊" becomes "Kai M. 🦊".
 */
export function shortName(raw: string, letters = 1): string {
  const { words, first, family } = parts(raw);
  if (family < 0) return words.join(' ');
  const kept = words.flatMap((word, i) => {
    if (i === family) return [`${leadingLetters(word, letters)}.`];
    if (i === first || !hasLetter(word)) return [word];
    return [];
  });
  return kept.join(' ');
}

/** How many letters of the family name `shortName` can use at most. */
function familyLetters(raw: string): number {
  const { words, family } = parts(raw);
  return family < 0 ? 0 : letterCount(words[family]!.replace(/\.$/, ''));
}

export type PickedName =
  | { name: string; clash: false; lengthenedFrom?: string }
  | { name: string; clash: true };

/**
 * The short name for a full name that no one in `taken` has: the first letter of the family
 * name, else as many more letters as tell the two apart ("Kai M." taken → "Kai Mü."). When even
 * the whole family name is taken, `clash` is true and the coach chooses the name.
 */
export function pickName(raw: string, taken: TakenNames): PickedName {
  const first = shortName(raw, 1);
  if (!taken.has(first)) return { name: first, clash: false };
  for (let letters = 2; letters <= familyLetters(raw); letters++) {
    const name = shortName(raw, letters);
    if (!taken.has(name)) return { name, clash: false, lengthenedFrom: first };
  }
  return { name: first, clash: true };
}
