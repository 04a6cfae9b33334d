/**
 * Clock times of a plan: the one place that decides where a plan sits on the clock. A match
 * warm-up ENDS at kick-off, so its minute 0 is its length before kick-off; a training session
 * STARTS at its start time. The plan page, the helper view, the home page, the calendar feed,
 * the printed card and the share e-mail all read clock times from here. Pure TypeScript: minutes
 * since midnight in, minutes since midnight out; words and locale are locale-format.ts's job.
 */
import '../i18n/localize';
import type { PlanKind } from '../types/plan-request';

/** Minutes in a day; clock times wrap past midnight. */
const DAY = 1440;

/** Minutes since midnight for "HH:MM" (24-hour, as times are stored), or null when absent or malformed. */
export function parseClock(hhmm: string | null | undefined): number | null {
  const match = /^([01]?\d|2[0-3]):([0-5]\d)$/.exec(hhmm ?? '');
  return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

/** Minutes since midnight folded into one day (−15 → 23:45, 1450 → 00:10). */
export function wrapDay(minutes: number): number {
  return ((Math.round(minutes) % DAY) + DAY) % DAY;
}

/** "HH:MM" (24-hour, zero-padded) for minutes since midnight: the stored form, never shown as is. */
export function storedClock(minutes: number): string {
  const m = wrapDay(minutes);
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/** A plan's length in minutes: the end of its last phase. */
export function planLength(phases: readonly { endMinute: number }[]): number {
  return phases.reduce((end, phase) => Math.max(end, phase.endMinute), 0);
}

/** Whether the given time is where the plan ends (kick-off) rather than where it starts. */
export function endsAtGivenTime(kind: PlanKind): boolean {
  return kind === 'match-warm-up';
}

/**
 * Minutes from the given time to the plan's minute 0: −length for a match warm-up (it ends at
 * kick-off), 0 for a training session (it starts at its start time). For callers that work with
 * whole moments in a time zone (the calendar feed) rather than minutes of a day.
 */
export function startOffset(kind: PlanKind, length: number): number {
  return endsAtGivenTime(kind) ? -length : 0;
}

/** The name of the time a plan is given, as a field label: "Kick-off" or "Start time" (getters, made on each read). */
export const GIVEN_TIME_LABELS: Record<PlanKind, string> = {
  get 'match-warm-up'() {
    return $localize`Kick-off`;
  },
  get training() {
    return $localize`Start time`;
  },
};

/** The same in a sentence before the time: "kick-off 10:30", "start 18:00". */
export const GIVEN_TIME_IN_A_SENTENCE: Record<PlanKind, string> = {
  'match-warm-up': 'kick-off',
  training: 'start',
};

/** Where a plan sits on the clock: minute 0, the end, and any plan minute in between. */
export interface SessionClock {
  /** Minutes since midnight at the plan's minute 0, or null when no time was given. */
  readonly start: number | null;
  /** Minutes since midnight at the plan's end (kick-off for a match warm-up), or null. */
  readonly end: number | null;
  /** Minutes since midnight (wrapped into one day) at a plan minute, or null without a time. */
  at(minute: number): number | null;
}

/**
 * The clock of a plan of `kind` lasting `length` minutes, given its "HH:MM" time: the kick-off
 * for a match warm-up (the plan ends there), the start time for a training session.
 */
export function sessionClock(kind: PlanKind, time: string | null | undefined, length: number): SessionClock {
  const given = parseClock(time);
  const start = given === null ? null : given + startOffset(kind, length);
  const at = (minute: number) => (start === null ? null : wrapDay(start + minute));
  return { start: start === null ? null : wrapDay(start), end: at(length), at };
}
