/**
 * The words of a rule set: what a coach or head of coaching reads in it (activity titles,
 * summaries, descriptions, coaching points, easier and harder steps, phase names, the rules'
 * descriptions and reasons, sources), as opposed to its ids, codes and numbers.
 *
 * The starting rules are written in the source language, with each of their sentences translated
 * in rules/words/<language>.json. A club's rules keep them in the source language; a reader gets
 * them in theirs. A sentence a club wrote itself is not in the list and stays as written.
 */

/** Fields whose string is words. */
const WORD_FIELDS = new Set([
  'name',
  'title',
  'summary',
  'description',
  'message',
  'reason',
  'effect',
  'source',
]);
/** Fields whose strings (a list) are words. */
const WORD_LISTS = new Set(['coachingPoints', 'easier', 'harder']);

/** A copy of `value` with every word of it passed through `word`; ids, codes and numbers untouched. */
export function mapRuleSetWords<T>(value: T, word: (text: string) => string): T {
  const walk = (node: unknown, key: string | null, inList: boolean): unknown => {
    if (typeof node === 'string') return inList || (key !== null && WORD_FIELDS.has(key)) ? word(node) : node;
    if (Array.isArray(node)) return node.map((item) => walk(item, null, key !== null && WORD_LISTS.has(key)));
    if (node && typeof node === 'object')
      return Object.fromEntries(Object.entries(node).map(([k, v]) => [k, walk(v, k, false)]));
    return node;
  };
  return walk(value, null, false) as T;
}

/** Every word of a rule set, once each. */
export function ruleSetWords(value: unknown): string[] {
  const words = new Set<string>();
  mapRuleSetWords(value, (text) => {
    words.add(text);
    return text;
  });
  return [...words];
}
