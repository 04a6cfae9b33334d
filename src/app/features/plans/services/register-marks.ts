import type { AttendanceEntryDto, TeamDto, UserDto } from '../../../../../shared/types';

/** One player's line on the register as the coach marks it; minutes are text until checked. */
export interface RegisterMark {
  came: boolean;
  /** Minutes late as typed; null when on time. */
  late: string | null;
  /** Minutes left early as typed; null when they stayed. */
  early: string | null;
}

export type RegisterMarks = Record<string, RegisterMark>;

export const MAX_MINUTES = 240;

/** Marks from a saved register (or pitch-side's record): everyone listed came. */
export function marksFrom(entries: AttendanceEntryDto[]): RegisterMarks {
  const marks: RegisterMarks = {};
  for (const e of entries) {
    marks[e.playerId] = {
      came: true,
      late: e.lateMinutes ? String(e.lateMinutes) : null,
      early: e.leftEarlyMinutes ? String(e.leftEarlyMinutes) : null,
    };
  }
  return marks;
}

/** What is wrong with typed minutes, in a coach's words; null when they are fine. */
export function minutesProblem(text: string | null, what: 'late' | 'left early'): string | null {
  if (text === null) return null;
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed))
    return what === 'late'
      ? $localize`Minutes late: type a whole number, such as 10.`
      : $localize`Minutes left early: type a whole number, such as 10.`;
  const n = Number(trimmed);
  if (n < 1 || n > MAX_MINUTES)
    return what === 'late'
      ? $localize`Minutes late: from 1 to ${MAX_MINUTES}:maxMinutes:.`
      : $localize`Minutes left early: from 1 to ${MAX_MINUTES}:maxMinutes:.`;
  return null;
}

/** Late and early together must leave some of the session; null when they do. */
export function lengthProblem(mark: RegisterMark, sessionMinutes: number): string | null {
  const late = mark.late !== null && !minutesProblem(mark.late, 'late') ? Number(mark.late) : 0;
  const early = mark.early !== null && !minutesProblem(mark.early, 'left early') ? Number(mark.early) : 0;
  return late + early >= sessionMinutes && late + early > 0
    ? $localize`Late and early together leave no time in the ${sessionMinutes}:sessionMinutes:-minute session.`
    : null;
}

/** The register to send: players who came, in the squad's order, with their minutes. */
export function entriesOf(marks: RegisterMarks, order: string[]): AttendanceEntryDto[] {
  return order
    .filter((id) => marks[id]?.came)
    .map((playerId) => {
      const m = marks[playerId]!;
      return {
        playerId,
        ...(m.late !== null && !minutesProblem(m.late, 'late') ? { lateMinutes: Number(m.late) } : {}),
        ...(m.early !== null && !minutesProblem(m.early, 'left early')
          ? { leftEarlyMinutes: Number(m.early) }
          : {}),
      };
    });
}

/** "11 of 14 came · 1 late · 1 left early". */
export function registerLine(marks: RegisterMarks, squad: number): string {
  const came = Object.values(marks).filter((m) => m.came);
  const late = came.filter((m) => m.late !== null).length;
  const early = came.filter((m) => m.early !== null).length;
  const parts = [$localize`:The register in short:${came.length}:came: of ${squad}:squad: came`];
  if (late) parts.push($localize`:The register in short, how many came late:${late}:count: late`);
  if (early) parts.push($localize`:The register in short, how many left early:${early}:count: left early`);
  return parts.join(' · ');
}

/**
 * Who may take a team's register: the lead, or a coach or assistant attached to the team. Mirrors
 * `ClubScope.teamToRun` on the server; change the two together.
 */
export function canTakeRegister(
  user: Pick<UserDto, 'id' | 'role'> | null,
  team: Pick<TeamDto, 'coachIds'> | null,
): boolean {
  if (!user || !team) return false;
  return user.role === 'lead' || team.coachIds.includes(user.id);
}
