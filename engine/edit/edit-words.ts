/**
 * What a coach reads when an edit cannot be made: one place for the words, so the plan page,
 * pitch-side and the server say the same thing. No codes, ids or rule names.
 */
import type { Area } from '../../shared/types';

/** Both sides, even for a square: "9 × 9 m" reads as an area where "9 m" does not. */
const sides = (a: Area) => `${a.width} × ${a.length} m`;

export const editWords = {
  /** The area is at its largest or smallest, set by the space or by the club's rules. */
  areaLimit(size: 'larger' | 'smaller', by: 'space' | 'rules', at: Area): string {
    const area = sides(at);
    if (size === 'larger') {
      return by === 'space'
        ? `Largest area for this space: ${area}.`
        : `Largest area the club's rules allow for this group: ${area}.`;
    }
    return by === 'space'
      ? `Smallest area for this space: ${area}.`
      : `Smallest area the club's rules allow for this group: ${area}.`;
  },
  /** A larger area would not fit beside the phase's other stations. */
  areaNoRoom(next: Area): string {
    return `No room for a ${sides(next)} area beside the other stations.`;
  },
  /** A swap the rules or the numbers rule out. */
  swapRefused(title: string, reason: string): string {
    return `${title} cannot be used here: ${reason}.`;
  },
  /** A swap whose activity does not fit. */
  swapNoFit(players: number): string {
    return `it does not fit the space or the kit for ${players} players`;
  },
  /** A drinks break has nothing to swap. */
  swapBreak: 'a drinks break has no stations',
} as const;
