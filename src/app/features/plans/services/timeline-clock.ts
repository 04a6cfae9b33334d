import type { Phase, PlanKind } from '../../../../../shared/types';
import { clockText } from '../../../../../shared/time/locale-format';
import { planLength, sessionClock } from '../../../../../shared/time/session-clock';
import { browserLocale } from '../../../core/locale/locale-format';

/** The clock times a plan's timeline shows: each phase's start and the plan's end, or nulls without a time. */
export interface TimelineClock {
  starts: (string | null)[];
  end: string | null;
}

/**
 * Clock times of the phases on screen (plan page, helper view): through the shared session clock,
 * so a match warm-up ends at kick-off and a training session starts at its start time, written in
 * the browser's locale unless one is given.
 */
export function timelineClock(
  phases: readonly Phase[],
  kind: PlanKind,
  time: string | null | undefined,
  locale = browserLocale(),
): TimelineClock {
  const clock = sessionClock(kind, time, planLength(phases));
  const words = (minutes: number | null) => (minutes === null ? null : clockText(minutes, locale));
  return { starts: phases.map((phase) => words(clock.at(phase.startMinute))), end: words(clock.end) };
}
