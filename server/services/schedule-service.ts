import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import {
  addDays,
  MAX_WEEKLY_SESSIONS,
  weeklyDates,
  type ScheduledSessionBody,
  type ScheduledSessionDto,
  type WeeklySessionsBody,
} from '../../shared/types/schedule';
import { Club, DEFAULT_TIME_ZONE } from '../entities/club';
import { ScheduledSession } from '../entities/scheduled-session';
import type { Team } from '../entities/team';
import { badRequest, forbidden, notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import { todayIn } from './local-time';

/** GET …/schedule and /scheduled-sessions: from a day (today in the club's zone when left out), for some days. */
export interface ScheduleQuery {
  from?: string;
  days: number;
}

/** At most this many sessions in one answer. */
const LIST_LIMIT = 400;

/** The club's time zone ('Europe/London' unless the club row says otherwise). */
export async function clubTimeZone(manager: EntityManager, clubId: string): Promise<string> {
  const club = await manager
    .getRepository(Club)
    .findOne({ where: { id: clubId }, select: ['id', 'timeZone'] });
  return club?.timeZone ?? DEFAULT_TIME_ZONE;
}

/** The latest plan made for each of these sessions. */
export async function latestPlans(
  manager: EntityManager,
  sessionIds: string[],
): Promise<Map<string, string>> {
  if (!sessionIds.length) return new Map();
  const rows: { sessionId: string; planId: string }[] = await manager.query(
    `SELECT DISTINCT ON ("scheduledSessionId") "scheduledSessionId" AS "sessionId", id AS "planId"
       FROM session_plan WHERE "scheduledSessionId" = ANY($1::uuid[])
      ORDER BY "scheduledSessionId", "createdAt" DESC`,
    [sessionIds],
  );
  return new Map(rows.map((row) => [row.sessionId, row.planId]));
}

function sessionDto(
  row: ScheduledSession,
  teamName: string,
  timeZone: string,
  planId: string | null,
): ScheduledSessionDto {
  return {
    id: row.id,
    teamId: row.teamId,
    teamName,
    date: row.date,
    startTime: row.startTime,
    kind: row.kind,
    minutes: row.minutes,
    place: row.place,
    timeZone,
    planId,
  };
}

/**
 * A team's schedule of training nights and matches. Everyone who may read the team reads it;
 * the lead and the team's own staff (its coaches and assistants) change it.
 */
export class ScheduleService {
  constructor(private readonly scope: ClubScope) {}

  private get manager(): EntityManager {
    return this.scope.manager;
  }

  /** 404 outside the club; 403 unless the caller is the lead or on the team's staff. */
  async teamToSchedule(teamId: string): Promise<Team> {
    const team = await this.scope.team(teamId);
    if (this.scope.auth.role !== 'lead' && !(await this.scope.isAttached(team.id))) {
      throw forbidden(
        $localize`Only the head of coaching and this team’s coaches and assistants can change its schedule.`,
      );
    }
    return team;
  }

  async list(teamId: string, query: ScheduleQuery): Promise<ScheduledSessionDto[]> {
    const team = await this.scope.teamToRead(teamId);
    const zone = await clubTimeZone(this.manager, this.scope.clubId);
    const from = query.from ?? todayIn(zone);
    const rows = await this.manager
      .getRepository(ScheduledSession)
      .createQueryBuilder('s')
      .where('s."clubId" = :clubId AND s."teamId" = :teamId', { clubId: this.scope.clubId, teamId: team.id })
      .andWhere('s.date BETWEEN :from AND :to', { from, to: addDays(from, query.days - 1) })
      .orderBy('s.date')
      .addOrderBy('s."startTime"')
      .limit(LIST_LIMIT)
      .getMany();
    return this.dtos(rows, new Map([[team.id, team.name]]), zone);
  }

  /**
   * Sessions of the caller's teams in time order: every team of the club for the lead, the teams
   * they are attached to for coaches and assistants.
   */
  async upcoming(query: ScheduleQuery): Promise<ScheduledSessionDto[]> {
    const zone = await clubTimeZone(this.manager, this.scope.clubId);
    const from = query.from ?? todayIn(zone);
    const qb = this.manager
      .getRepository(ScheduledSession)
      .createQueryBuilder('s')
      .innerJoin('s.team', 't')
      .addSelect(['t.id', 't.name'])
      .where('s."clubId" = :clubId', { clubId: this.scope.clubId })
      .andWhere('s.date BETWEEN :from AND :to', { from, to: addDays(from, query.days - 1) });
    if (this.scope.auth.role !== 'lead') {
      qb.andWhere('s."teamId" IN (SELECT tc."teamId" FROM team_coach tc WHERE tc."userId" = :userId)', {
        userId: this.scope.auth.userId,
      });
    }
    const rows = await qb
      .orderBy('s.date')
      .addOrderBy('s."startTime"')
      .addOrderBy('t.name')
      .limit(LIST_LIMIT)
      .getMany();
    return this.dtos(rows, new Map(rows.map((row) => [row.teamId, row.team?.name ?? ''])), zone);
  }

  /** One session, for whoever may read its team (the wizard starts from it). */
  async get(sessionId: string): Promise<ScheduledSessionDto> {
    const row = await this.scope.byId(ScheduledSession, sessionId, 'scheduled session');
    const team = await this.scope.teamToRead(row.teamId);
    return (await this.dtos([row], new Map([[team.id, team.name]])))[0]!;
  }

  async create(teamId: string, body: ScheduledSessionBody): Promise<ScheduledSessionDto> {
    const team = await this.teamToSchedule(teamId);
    const saved = await this.manager.getRepository(ScheduledSession).save(this.row(team, body, body.date));
    return (await this.dtos([saved], new Map([[team.id, team.name]])))[0]!;
  }

  /** The same night every week from `date` to `until`, at most MAX_WEEKLY_SESSIONS, in one go. */
  async createWeekly(teamId: string, body: WeeklySessionsBody): Promise<ScheduledSessionDto[]> {
    const team = await this.teamToSchedule(teamId);
    if (body.until < body.date) {
      throw badRequest($localize`The last day comes before the first.`, [
        {
          field: 'until',
          message: $localize`:field error after the field's name:must be on or after the first day`,
        },
      ]);
    }
    const dates = weeklyDates(body.date, body.until);
    if (dates.length > MAX_WEEKLY_SESSIONS) {
      const lastPossible = addDays(body.date, 7 * (MAX_WEEKLY_SESSIONS - 1));
      throw badRequest($localize`At most ${MAX_WEEKLY_SESSIONS}:maxWeeks: weeks can be added at once.`, [
        {
          field: 'until',
          message: $localize`:field error after the field's name:must be within ${MAX_WEEKLY_SESSIONS}:maxWeeks: weeks of the first day (last possible: ${lastPossible}:lastDate:)`,
        },
      ]);
    }
    const saved = await this.manager
      .getRepository(ScheduledSession)
      .save(dates.map((date) => this.row(team, body, date)));
    return this.dtos(saved, new Map([[team.id, team.name]]));
  }

  async update(
    teamId: string,
    sessionId: string,
    body: Partial<ScheduledSessionBody>,
  ): Promise<ScheduledSessionDto> {
    const team = await this.teamToSchedule(teamId);
    const row = await this.ofTeam(team, sessionId);
    if (body.date !== undefined) row.date = body.date;
    if (body.startTime !== undefined) row.startTime = body.startTime;
    if (body.kind !== undefined) row.kind = body.kind;
    if (body.minutes !== undefined) row.minutes = body.minutes;
    if (body.place !== undefined) row.place = body.place.trim();
    const saved = await this.manager.getRepository(ScheduledSession).save(row);
    return (await this.dtos([saved], new Map([[team.id, team.name]])))[0]!;
  }

  /** Deletes the session; a plan made for it stays, no longer tied to it. */
  async remove(teamId: string, sessionId: string): Promise<void> {
    const team = await this.teamToSchedule(teamId);
    await this.manager
      .getRepository(ScheduledSession)
      .delete({ id: (await this.ofTeam(team, sessionId)).id });
  }

  private async ofTeam(team: Team, sessionId: string): Promise<ScheduledSession> {
    const row = await this.manager
      .getRepository(ScheduledSession)
      .findOneBy({ id: sessionId, teamId: team.id, clubId: this.scope.clubId });
    if (!row) throw notFound('scheduled session');
    return row;
  }

  private row(team: Team, body: ScheduledSessionBody, date: string): ScheduledSession {
    return Object.assign(new ScheduledSession(), {
      clubId: this.scope.clubId,
      teamId: team.id,
      date,
      startTime: body.startTime,
      kind: body.kind,
      minutes: body.minutes,
      place: (body.place ?? '').trim(),
    });
  }

  private async dtos(
    rows: ScheduledSession[],
    teamNames: Map<string, string>,
    zone?: string,
  ): Promise<ScheduledSessionDto[]> {
    const timeZone = zone ?? (await clubTimeZone(this.manager, this.scope.clubId));
    const plans = await latestPlans(
      this.manager,
      rows.map((row) => row.id),
    );
    return rows.map((row) =>
      sessionDto(row, teamNames.get(row.teamId) ?? '', timeZone, plans.get(row.id) ?? null),
    );
  }
}
