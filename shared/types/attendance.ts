import type { Plan } from './plan';
import type { PlanRequest } from './plan-request';

/** What the register is read from: the plan's players and length, and its roster changes. */
export interface PlanRoster {
  request: Pick<PlanRequest, 'players' | 'minutes'>;
  rosterChanges?: Plan['rosterChanges'];
}

/** One player who came to a session: on time, or late, or leaving early (both still count as came). */
export interface AttendanceEntryDto {
  playerId: string;
  /** Minutes after the start the player arrived; absent when on time. */
  lateMinutes?: number;
  /** Minutes before the end the player left; absent when they stayed to the end. */
  leftEarlyMinutes?: number;
}

/** Body of PUT /api/plans/:id/attendance: the new form, or `playerIds` from older clients. */
export type AttendanceUpdate = { players: AttendanceEntryDto[] } | { playerIds: string[] };

/**
 * Who came to a session, read from the plan pitch-side kept: everyone who was in it at some
 * minute, with the minutes they came late or left early. A late arrival and an early leaver
 * both came; a player taken off before the start (minute 0) did not.
 */
export function attendanceFromPlan(plan: PlanRoster): AttendanceEntryDto[] {
  const changes = [...(plan.rosterChanges ?? [])].sort((a, b) => a.fromMinute - b.fromMinute);
  const minutes = plan.request.minutes;
  // Who was there at the start: today's players with every change undone, newest first.
  const start = new Set(plan.request.players.map((p) => p.id));
  for (const change of [...changes].reverse()) {
    for (const id of change.added) start.delete(id);
    for (const id of change.removed) start.add(id);
  }
  const order: string[] = [...start];
  const joined = new Map<string, number>([...start].map((id) => [id, 0]));
  const left = new Map<string, number>();
  for (const change of changes) {
    const at = Math.max(0, Math.min(minutes, change.fromMinute));
    for (const id of change.added) {
      if (!joined.has(id)) {
        joined.set(id, at);
        order.push(id);
      }
      left.delete(id);
    }
    for (const id of change.removed) left.set(id, at);
  }
  const out: AttendanceEntryDto[] = [];
  for (const id of order) {
    const from = joined.get(id)!;
    const to = left.get(id) ?? minutes;
    if (to <= from) continue;
    out.push({
      playerId: id,
      ...(from > 0 ? { lateMinutes: from } : {}),
      ...(to < minutes ? { leftEarlyMinutes: minutes - to } : {}),
    });
  }
  return out;
}

/** Players who came and then left a running session, so nobody waits for them to arrive. */
export function leftEarlyIds(plan: PlanRoster): Set<string> {
  const here = new Set(plan.request.players.map((p) => p.id));
  return new Set(
    attendanceFromPlan(plan)
      .map((e) => e.playerId)
      .filter((id) => !here.has(id)),
  );
}
