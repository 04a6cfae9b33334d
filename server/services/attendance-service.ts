import '../../shared/i18n/localize';
import { In } from 'typeorm';
import type { AttendanceDto, AttendanceEntryDto } from '../../shared/types';
import { Attendance } from '../entities/attendance';
import { Player } from '../entities/player';
import { badRequest, type FieldError } from '../http/problem';
import type { ClubScope } from './club-scope';

/** A body of PUT /plans/:id/attendance as validated: the new form or an older client's list. */
export type AttendanceInput = { players: AttendanceEntryDto[] } | { playerIds: string[] };

/** The entries a body stands for: an older client's `playerIds` are players who came on time. */
export function attendanceEntries(input: AttendanceInput): { entries: AttendanceEntryDto[]; field: string } {
  if ('players' in input) return { entries: input.players, field: 'players' };
  return { entries: input.playerIds.map((playerId) => ({ playerId })), field: 'playerIds' };
}

function entryOf(row: Attendance): AttendanceEntryDto {
  return {
    playerId: row.playerId,
    ...(row.lateMinutes !== null ? { lateMinutes: row.lateMinutes } : {}),
    ...(row.leftEarlyMinutes !== null ? { leftEarlyMinutes: row.leftEarlyMinutes } : {}),
  };
}

function dtoOf(planId: string, entries: AttendanceEntryDto[]): AttendanceDto {
  return {
    planId,
    playerIds: entries.map((e) => e.playerId),
    players: entries,
    recorded: entries.length > 0,
  };
}

/**
 * The register of a planned session: who came, how late, how early they left. The team's own
 * staff take it (the lead, its coaches and assistants); anyone who can see the team can read it.
 */
export class AttendanceService {
  constructor(private readonly scope: ClubScope) {}

  async get(planId: string): Promise<AttendanceDto> {
    const plan = await this.scope.plan(planId);
    await this.scope.teamToRead(plan.teamId);
    const rows = await this.scope.manager
      .getRepository(Attendance)
      .find({ where: { planId: plan.id, clubId: this.scope.clubId }, order: { recordedAt: 'ASC' } });
    return dtoOf(plan.id, rows.map(entryOf));
  }

  /** Replaces the register; every player must be one of the plan's team, each once. */
  async put(planId: string, input: AttendanceInput): Promise<AttendanceDto> {
    const { entries, field } = attendanceEntries(input);
    return this.scope.transaction(async (scope) => {
      const plan = await scope.plan(planId);
      await scope.teamToRun(plan.teamId);
      const ids = entries.map((e) => e.playerId);
      const known = new Set(
        (
          await scope.manager.getRepository(Player).find({
            select: { id: true },
            where: { id: In(ids), teamId: plan.teamId, clubId: scope.clubId },
          })
        ).map((p) => p.id),
      );
      const seen = new Set<string>();
      const errors: FieldError[] = [];
      const minutes = plan.plan.request.minutes;
      entries.forEach(({ playerId, lateMinutes = 0, leftEarlyMinutes = 0 }, i) => {
        const at = field === 'players' ? `players/${i}/playerId` : `playerIds/${i}`;
        if (!known.has(playerId))
          errors.push({
            field: at,
            message: $localize`:field error after the field's name:is not a player of this team`,
          });
        else if (seen.has(playerId))
          errors.push({
            field: at,
            message: $localize`:field error after the field's name:is on the register twice`,
          });
        seen.add(playerId);
        if (lateMinutes + leftEarlyMinutes >= minutes) {
          errors.push({
            field: `players/${i}/${leftEarlyMinutes ? 'leftEarlyMinutes' : 'lateMinutes'}`,
            message: $localize`:field error after the field's name:leaves no time in the ${minutes}:minutes:-minute session`,
          });
        }
      });
      if (errors.length) throw badRequest($localize`Some players on the register are not right.`, errors);
      await scope.manager.getRepository(Attendance).delete({ planId: plan.id, clubId: scope.clubId });
      if (entries.length) {
        await scope.manager.getRepository(Attendance).insert(
          entries.map((e) => ({
            clubId: scope.clubId,
            planId: plan.id,
            playerId: e.playerId,
            lateMinutes: e.lateMinutes ?? null,
            leftEarlyMinutes: e.leftEarlyMinutes ?? null,
            recordedById: scope.auth.userId,
          })),
        );
      }
      return dtoOf(plan.id, entries);
    });
  }
}
