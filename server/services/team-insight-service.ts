import '../../shared/i18n/localize';
import { In } from 'typeorm';
import { attendanceFromPlan } from '../../engine';
import type { AttendanceEntryDto } from '../../shared/types/attendance';
import type { InsightPlayerDto, InsightSessionDto, TeamInsightDto } from '../../shared/types/plan-api';
import { Attendance } from '../entities/attendance';
import { Player } from '../entities/player';
import { SessionPlan } from '../entities/session-plan';
import type { ClubScope } from './club-scope';

/** How many of the team's latest sessions the insight covers. */
export const INSIGHT_SESSIONS = 30;

/** How the insight's numbers are made, said under them. */
function estimateNote(): string {
  return $localize`Touches are estimates from each activity’s typical rate per minute, not counts. Players who came late or left early count as present. Sessions without a register count the players the plan was made for, with pitch-side arrivals and leavers.`;
}

/** Attendance over time and estimated touches per player, from stored plans and attendance. */
export class TeamInsightService {
  constructor(private readonly scope: ClubScope) {}

  async insight(teamId: string): Promise<TeamInsightDto> {
    const { manager, clubId } = this.scope;
    const team = await this.scope.teamToRead(teamId);
    const latest = await manager.getRepository(SessionPlan).find({
      where: { teamId: team.id, clubId },
      order: { date: { direction: 'DESC', nulls: 'LAST' }, createdAt: 'DESC' },
      take: INSIGHT_SESSIONS,
    });
    const plans = latest.reverse();
    const attendance = plans.length
      ? await manager
          .getRepository(Attendance)
          .find({ where: { planId: In(plans.map((p) => p.id)), clubId } })
      : [];
    const cameTo = new Map<string, AttendanceEntryDto[]>();
    for (const a of attendance) {
      if (!cameTo.has(a.planId)) cameTo.set(a.planId, []);
      cameTo.get(a.planId)!.push({
        playerId: a.playerId,
        ...(a.lateMinutes !== null ? { lateMinutes: a.lateMinutes } : {}),
        ...(a.leftEarlyMinutes !== null ? { leftEarlyMinutes: a.leftEarlyMinutes } : {}),
      });
    }
    const roster = await manager.getRepository(Player).find({ where: { teamId: team.id, clubId } });
    // `estimated`: sessions whose plan has a touch estimate for the player (one marked present
    // who was not in the plan has none, and a zero there would read as "less of the ball").
    const totals = new Map<string, { sessions: number; estimated: number; touches: number }>(
      roster.map((p) => [p.id, { sessions: 0, estimated: 0, touches: 0 }]),
    );

    const sessions: InsightSessionDto[] = plans.map((row) => {
      const recorded = cameTo.get(row.id);
      // Without a register, pitch-side's record: late arrivals and early leavers came too.
      const register = recorded ?? attendanceFromPlan(row.plan);
      const present = new Set(register.map((e) => e.playerId));
      const touches: Record<string, number> = {};
      for (const id of present) {
        const t = totals.get(id);
        if (t) t.sessions++;
        const known = row.plan.touches?.[id];
        if (known === undefined) continue;
        const estimate = Math.round(known);
        touches[id] = estimate;
        if (t) {
          t.estimated++;
          t.touches += estimate;
        }
      }
      return {
        planId: row.id,
        date: row.date,
        createdAt: row.createdAt.toISOString(),
        kind: row.kind,
        present: present.size,
        recorded: !!recorded,
        cameLate: register.filter((e) => e.lateMinutes).length,
        leftEarly: register.filter((e) => e.leftEarlyMinutes).length,
        touches,
      };
    });
    const players: InsightPlayerDto[] = roster
      .map((p) => {
        const t = totals.get(p.id)!;
        return {
          playerId: p.id,
          displayName: p.displayName,
          active: p.active,
          sessionsAttended: t.sessions,
          totalTouches: t.touches,
          averageTouches: t.estimated ? Math.round(t.touches / t.estimated) : 0,
        };
      })
      .sort((a, b) => a.displayName.localeCompare(b.displayName));
    return {
      teamId: team.id,
      squadSize: roster.filter((p) => p.active).length,
      sessions,
      players,
      estimateNote: estimateNote(),
    };
  }
}
