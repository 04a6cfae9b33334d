/**
 * What a coach reads when an edit cannot be made: one place for the words, so the plan page,
 * pitch-side and the server say the same thing. No codes, ids or rule names. Every word is made
 * on each call, so the server says it in the language of the request.
 */
import '../../shared/i18n/localize';
import type { Area } from '../../shared/types';

/** Both sides, even for a square: "9 × 9 m" reads as an area where "9 m" does not. */
const sides = (a: Area) => `${a.width} × ${a.length} m`;

export const editWords = {
  /** The area is at its largest or smallest, set by the space or by the club's rules. */
  areaLimit(size: 'larger' | 'smaller', by: 'space' | 'rules', at: Area): string {
    const area = sides(at);
    if (size === 'larger') {
      return by === 'space'
        ? $localize`:an area at its largest, e.g. 20 × 30 m:Largest area for this space: ${area}:area:.`
        : $localize`:an area at its largest, e.g. 20 × 30 m:Largest area the club's rules allow for this group: ${area}:area:.`;
    }
    return by === 'space'
      ? $localize`:an area at its smallest, e.g. 9 × 12 m:Smallest area for this space: ${area}:area:.`
      : $localize`:an area at its smallest, e.g. 9 × 12 m:Smallest area the club's rules allow for this group: ${area}:area:.`;
  },
  /** A larger area would not fit beside the phase's other stations. */
  areaNoRoom(next: Area): string {
    const area = sides(next);
    return $localize`:a larger area that does not fit, e.g. 20 × 30 m:No room for a ${area}:area: area beside the other stations.`;
  },
  /** A swap the rules or the numbers rule out. */
  swapRefused(title: string, reason: string): string {
    return $localize`:an activity a coach asked for and why it cannot be used, the reason starts in lower case:${title}:activity: cannot be used here: ${reason}:reason:.`;
  },
  /** A swap whose activity does not fit. */
  swapNoFit(players: number): string {
    return players === 1
      ? $localize`:why an activity cannot be used, ends a sentence that starts with the activity's title and cannot be used here:it does not fit the space or the kit for 1 player`
      : $localize`:why an activity cannot be used, ends a sentence that starts with the activity's title and cannot be used here:it does not fit the space or the kit for ${players}:players: players`;
  },
  /** A drinks break has nothing to swap. */
  get swapBreak(): string {
    return $localize`:why an activity cannot be used, ends a sentence that starts with the activity's title and cannot be used here:a drinks break has no stations`;
  },
};
