import { In, type DataSource } from 'typeorm';
import type { AttendanceDto } from '../../shared/types/api';
import { Attendance } from '../entities/attendance';
import { Player } from '../entities/player';
import type { AuthContext } from '../http/auth-context';
import { badRequest } from '../http/problem';
import { ClubScope } from './club-scope';

/** Who came to a planned session. Any member who can see the team records it. */
export class AttendanceService {
  constructor(private readonly dataSource: DataSource) {}

  async get(auth: AuthContext, planId: string): Promise<AttendanceDto> {
    const scope = new ClubScope(this.dataSource.manager, auth);
    const plan = await scope.plan(planId);
    await scope.teamToRead(plan.teamId);
    const rows = await this.dataSource.manager
      .getRepository(Attendance)
      .find({ where: { planId: plan.id, clubId: auth.clubId }, order: { recordedAt: 'ASC' } });
    return { planId: plan.id, playerIds: rows.map((r) => r.playerId) };
  }

  /** Replaces the list; every id must be a player of the plan's team. */
  async put(auth: AuthContext, planId: string, playerIds: string[]): Promise<AttendanceDto> {
    return this.dataSource.transaction(async (manager) => {
      const scope = new ClubScope(manager, auth);
      const plan = await scope.plan(planId);
      await scope.teamToRead(plan.teamId);
      const known = new Set(
        (
          await manager.getRepository(Player).find({
            select: { id: true },
            where: { id: In(playerIds), teamId: plan.teamId, clubId: auth.clubId },
          })
        ).map((p) => p.id),
      );
      const errors = playerIds
        .map((id, i) => ({ id, i }))
        .filter(({ id }) => !known.has(id))
        .map(({ i }) => ({ field: `playerIds/${i}`, message: 'is not a player of this team' }));
      if (errors.length) throw badRequest('Some players are not in this team.', errors);
      await manager.getRepository(Attendance).delete({ planId: plan.id, clubId: auth.clubId });
      if (playerIds.length) {
        await manager.getRepository(Attendance).insert(
          playerIds.map((playerId) => ({
            clubId: auth.clubId,
            planId: plan.id,
            playerId,
            recordedById: auth.userId,
          })),
        );
      }
      return { planId: plan.id, playerIds };
    });
  }
}
