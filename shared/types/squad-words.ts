import '../i18n/localize';
import type { AgeGroup, Level } from './plan-request';

/** A squad's level in words, on every screen, the card and e-mails (never the code). */
export const LEVEL_LABELS: Record<Level, string> = {
  beginner: $localize`:squad level:Beginner`,
  intermediate: $localize`:squad level:Intermediate`,
  advanced: $localize`:squad level:Advanced`,
};

/** An age group as coaches write it: "U10" stays (the trade's own shorthand), "adult" reads "Adult". */
export function ageGroupLabel(ageGroup: AgeGroup): string {
  return ageGroup === 'adult' ? $localize`:age group:Adult` : ageGroup;
}
