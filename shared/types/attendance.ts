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
