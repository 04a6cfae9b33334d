import type { Plan } from '../../shared/types';

/** Minutes since midnight for "HH:MM", or null when absent or malformed. */
export function parseClock(hhmm: string | null | undefined): number | null {
  const match = /^([01]\d|2[0-3]):([0-5]\d)/.exec(hhmm ?? '');
  return match ? Number(match[1]) * 60 + Number(match[2]) : null;
}

/** "HH:MM" for minutes since midnight, wrapping past midnight. */
export function formatClock(minutes: number): string {
  const m = ((Math.round(minutes) % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, '0')}:${String(m % 60).padStart(2, '0')}`;
}

/** Total planned minutes: the end of the last phase. */
export function planMinutes(plan: Plan): number {
  return plan.phases.reduce((end, phase) => Math.max(end, phase.endMinute), 0);
}

/**
 * Clock time at the plan's minute 0. A match warm-up counts down to kick-off, so it starts
 * `total` minutes before; a training session starts at the given time.
 */
export function sessionStart(plan: Plan, kickOff: string | null | undefined): number | null {
  const clock = parseClock(kickOff);
  if (clock === null) return null;
  return plan.request.kind === 'match-warm-up' ? clock - planMinutes(plan) : clock;
}

/** Label for a plan minute: a clock time when the start is known, else "min 12". */
export function minuteLabel(start: number | null, minute: number): string {
  return start === null ? `min ${minute}` : formatClock(start + minute);
}
