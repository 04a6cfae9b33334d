import '../i18n/localize';
import type { AgeGroup, Level } from './plan-request';

/**
 * A squad's level in words, on every screen, the card and e-mails (never the code). Getters, so
 * each read is in the reader's language.
 */
export const LEVEL_LABELS: Record<Level, string> = {
  get beginner() {
    return $localize`:squad level:Beginner`;
  },
  get intermediate() {
    return $localize`:squad level:Intermediate`;
  },
  get advanced() {
    return $localize`:squad level:Advanced`;
  },
};

/**
 * An age group as coaches write it: "U10" (the trade's own shorthand in English, written the way
 * each language's coaches do in its translation), "adult" reads "Adult".
 */
export function ageGroupLabel(ageGroup: AgeGroup): string {
  if (ageGroup === 'adult') return $localize`:age group:Adult`;
  const years = ageGroup.slice(1);
  return $localize`:age group, players under this age:U${years}:years:`;
}
