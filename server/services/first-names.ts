import '../../shared/i18n/localize';

/**
 * First names only, for people outside the club's staff: "Kai M." → "Kai". The first word of the
 * stored name is kept and the rest (initials, surnames) dropped; when two players share a first
 * name the later ones are numbered in squad order: "Sam", "Sam 2", "Sam 3".
 */
export function firstNames(names: readonly (string | undefined)[]): string[] {
  const seen = new Map<string, number>();
  return names.map((name, index) => {
    const first = firstWord(name) ?? unnamedPlayer(index + 1);
    const key = first.toLocaleLowerCase();
    const count = (seen.get(key) ?? 0) + 1;
    seen.set(key, count);
    return count === 1 ? first : `${first} ${count}`;
  });
}

/** A player without a name, by their place in the squad. */
function unnamedPlayer(place: number): string {
  return $localize`:a player without a name, numbered in squad order:Player ${place}:number:`;
}

/** The first word of a name, without a trailing full stop or comma; null when there is none. */
function firstWord(name: string | undefined): string | null {
  const word = (name ?? '')
    .trim()
    .split(/\s+/u)[0]
    ?.replace(/[.,]+$/u, '');
  return word ? word : null;
}
