import '../../shared/i18n/localize';
import { In, type DataSource } from 'typeorm';
import type { AttendanceDto, AttendanceEntryDto } from '../../shared/types';
import { Attendance } from '../entities/attendance';
import { Player } from '../entities/player';
import type { AuthContext } from '../http/auth-context';
import { badRequest, type FieldError } from '../http/problem';
import { ClubScope } from './club-scope';

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
  constructor(private readonly dataSource: DataSource) {}

  async get(auth: AuthContext, planId: string): Promise<AttendanceDto> {
    const scope = new ClubScope(this.dataSource.manager, auth);
    const plan = await scope.plan(planId);
    await scope.teamToRead(plan.teamId);
    const rows = await this.dataSource.manager
      .getRepository(Attendance)
      .find({ where: { planId: plan.id, clubId: auth.clubId }, order: { recordedAt: 'ASC' } });
    return dtoOf(plan.id, rows.map(entryOf));
  }

  /** Replaces the register; every player must be one of the plan's team, each once. */
  async put(auth: AuthContext, planId: string, input: AttendanceInput): Promise<AttendanceDto> {
    const { entries, field } = attendanceEntries(input);
    return this.dataSource.transaction(async (manager) => {
      const scope = new ClubScope(manager, auth);
      const plan = await scope.plan(planId);
      await scope.teamToRun(plan.teamId);
      const ids = entries.map((e) => e.playerId);
      const known = new Set(
        (
          await manager.getRepository(Player).find({
            select: { id: true },
            where: { id: In(ids), teamId: plan.teamId, clubId: auth.clubId },
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
      await manager.getRepository(Attendance).delete({ planId: plan.id, clubId: auth.clubId });
      if (entries.length) {
        await manager.getRepository(Attendance).insert(
          entries.map((e) => ({
            clubId: auth.clubId,
            planId: plan.id,
            playerId: e.playerId,
            lateMinutes: e.lateMinutes ?? null,
            leftEarlyMinutes: e.leftEarlyMinutes ?? null,
            recordedById: auth.userId,
          })),
        );
      }
      return dtoOf(plan.id, entries);
    });
  }
}
