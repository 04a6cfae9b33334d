import { suitsAge } from '../../../core/engine/engine-adapter';
import type { AgeGroup, Focus, StationKind } from '../../../../../shared/types';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS } from '../../../core/labels/plan-labels';
import type { LibraryEntry } from './library-entries';

/** What the coach narrowed the library to; 'all' leaves a filter off. */
export interface LibraryFilter {
  ageGroup: AgeGroup | 'all';
  kind: StationKind | 'all';
  focus: Focus | 'all';
  /** Words whose starts are found in the title, summary, description, coaching points, kind or focus. */
  text: string;
}

export const NO_FILTER: LibraryFilter = { ageGroup: 'all', kind: 'all', focus: 'all', text: '' };

/** Lower case without accents, so "pase" finds "Pasé" and "1V1" finds "1v1". */
function fold(text: string): string {
  return text.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();
}

/** The words of an activity's text, folded, for matching the starts of words. */
function searchable(entry: LibraryEntry): string[] {
  const d = entry.definition;
  return fold(
    [
      entry.title,
      entry.summary,
      d.description,
      ...d.coachingPoints,
      ACTIVITY_KIND_LABELS[entry.kind],
      ...entry.focus.map((f) => FOCUS_LABELS[f]),
    ].join('\n'),
  )
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);
}

/**
 * The entries that pass every filter: the age group within the activity's ages (the engine's own
 * test), the kind, a focus it serves, and every word of the search as the start of a word in its
 * text ("pass" finds "passing", "fence" does not find "defenders").
 */
export function filterLibrary(entries: readonly LibraryEntry[], filter: LibraryFilter): LibraryEntry[] {
  const words = fold(filter.text)
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);
  return entries.filter((entry) => {
    if (filter.ageGroup !== 'all' && !suitsAge(entry, filter.ageGroup)) return false;
    if (filter.kind !== 'all' && entry.kind !== filter.kind) return false;
    if (filter.focus !== 'all' && !entry.focus.includes(filter.focus)) return false;
    if (!words.length) return true;
    const text = searchable(entry);
    return words.every((word) => text.some((w) => w.startsWith(word)));
  });
}
