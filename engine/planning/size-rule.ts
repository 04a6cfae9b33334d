/** Which group sizes a station of some kind may have. */
export interface SizeRule {
  min: number;
  preferred: number;
  max: number;
  allows(total: number): boolean;
}

/** A size rule for a contiguous range, the preferred size clamped into it. */
export function rangeRule(min: number, preferred: number, max: number): SizeRule {
  const p = Math.min(max, Math.max(min, preferred));
  return { min, preferred: p, max, allows: (t) => t >= min && t <= max };
}

/** The overlap of the club's sizes and an activity's player range; null when they do not meet. */
export function intersectRange(
  club: { min: number; preferred: number; max: number },
  activity: { min: number; max: number },
): SizeRule | null {
  const min = Math.max(club.min, activity.min);
  const max = Math.min(club.max, activity.max);
  if (min > max) return null;
  return rangeRule(min, club.preferred, max);
}
