import type { ScheduleKind } from '../../../../shared/types';
import { addDays } from '../../../../shared/types';
import { dayWords } from '../locale/locale-format';
import { isoDate } from '../time/dates';

/** Words for a scheduled session's kind. */
export const SCHEDULE_KIND_LABELS: Record<ScheduleKind, string> = {
  training: $localize`:Kind of scheduled session:Training`,
  match: $localize`:Kind of scheduled session:Match`,
};

/** "Today", "Tomorrow" or "Thu 3 Dec" (in the browser's locale) for a YYYY-MM-DD day. */
export function sessionDay(date: string, today = isoDate(new Date())): string {
  if (date === today) return $localize`Today`;
  if (date === addDays(today, 1)) return $localize`Tomorrow`;
  return dayWords(date);
}
