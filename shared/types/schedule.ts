/** A team's week: training nights and matches on its schedule, and its calendar feed. */
import type { PlanKind } from './plan-request';

export const SCHEDULE_KINDS = ['training', 'match'] as const;
/** A training night plans a session; a match day plans a warm-up before kick-off. */
export type ScheduleKind = (typeof SCHEDULE_KINDS)[number];

/** The kind of plan a scheduled session starts. */
export const PLAN_KIND_OF: Record<ScheduleKind, PlanKind> = {
  training: 'training',
  match: 'match-warm-up',
};

/** At most this many sessions come from one "repeat weekly" (a long term of weekly nights). */
export const MAX_WEEKLY_SESSIONS = 40;

/** One session on a team's schedule, in the club's local time. */
export interface ScheduledSessionDto {
  id: string;
  teamId: string;
  teamName: string;
  /** Local calendar day, YYYY-MM-DD. */
  date: string;
  /** Kick-off or start, HH:MM (24-hour), local time. */
  startTime: string;
  kind: ScheduleKind;
  /** Minutes the plan fills (the warm-up before a match, or the training session). */
  minutes: number;
  /** Where: a pitch, a park, a hall; empty when not said. */
  place: string;
  /** The club's time zone (IANA name) the date and time are in. */
  timeZone: string;
  /** The latest plan made from this session, if any. */
  planId: string | null;
}

/** Body of POST /api/teams/:id/schedule and PATCH …/schedule/:sessionId. */
export interface ScheduledSessionBody {
  date: string;
  startTime: string;
  kind: ScheduleKind;
  minutes: number;
  place?: string;
}

/** Body of POST /api/teams/:id/schedule/weekly: the same night every week from `date` to `until`. */
export interface WeeklySessionsBody extends ScheduledSessionBody {
  /** Last day to repeat on (inclusive), YYYY-MM-DD. */
  until: string;
}

/** Answer of GET/POST /api/teams/:id/calendar: the subscription address, or null when off. */
export interface TeamCalendarDto {
  /** Path of the feed on this server (/api/calendar/<secret>.ics), or null when none is on. */
  path: string | null;
}

/** The day `days` after a YYYY-MM-DD day (negative for before), as YYYY-MM-DD. */
export function addDays(date: string, days: number): string {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  return new Date(Date.UTC(y, m - 1, d + days)).toISOString().slice(0, 10);
}

/**
 * The same weekday every week from `first` to `until` (both YYYY-MM-DD, inclusive). Stops one
 * past MAX_WEEKLY_SESSIONS, so a caller can tell "too many" without building a long list.
 */
export function weeklyDates(first: string, until: string): string[] {
  const dates: string[] = [];
  for (let date = first; date <= until && dates.length <= MAX_WEEKLY_SESSIONS; date = addDays(date, 7)) {
    dates.push(date);
  }
  return dates;
}
