/** The drinks break: a phase of its own in the timeline, with no stations. */
import '../../shared/i18n/localize';
import type { Phase } from '../../shared/types';

export const BREAK_ACTIVITY_ID = 'drinks-break';

/** "Drinks break", or "Drinks break (heat)" when the heat brought it early. */
export function breakName(hot: boolean): string {
  return hot
    ? $localize`:name of a phase of the session, a drinks break brought early by the heat:Drinks break (heat)`
    : $localize`:name of a phase of the session:Drinks break`;
}

/** A drinks break from `start` for `minutes`; `hot` says why it came early. */
export function breakPhase(start: number, minutes: number, hot: boolean): Phase {
  return {
    name: breakName(hot),
    activityId: BREAK_ACTIVITY_ID,
    activityKind: 'break',
    startMinute: start,
    endMinute: start + minutes,
    stations: [],
    intensity: 1,
    slot: 'break',
  };
}

/** Whether a phase is a drinks break. */
export function isBreak(phase: Pick<Phase, 'activityKind'>): boolean {
  return phase.activityKind === 'break';
}
