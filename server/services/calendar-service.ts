import '../../shared/i18n/localize';
import ical, { ICalCalendarMethod } from 'ical-generator';
import type { EntityManager } from 'typeorm';
import type { TeamCalendarDto } from '../../shared/types/schedule';
import { addDays, PLAN_KIND_OF } from '../../shared/types/schedule';
import { startOffset } from '../../shared/time/session-clock';
import { ScheduledSession } from '../entities/scheduled-session';
import { Team } from '../entities/team';
import { TeamCalendar } from '../entities/team-calendar';
import { notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import { zonedMoment, todayIn } from './local-time';
import { timeInWords } from './session-day';
import { clubTimeZone, ScheduleService } from './schedule-service';
import { newLinkToken } from './link-token';

/** The feed lists sessions from this many days back (so last week's stay visible) … */
const FEED_DAYS_BACK = 35;
/** … and at most this many. */
const FEED_LIMIT = 400;

function feedPath(token: string): string {
  return `/api/calendar/${token}.ics`;
}

/** "U10 Falcons": the team's name with its age group in front unless the name already says it. */
export function teamLabel(team: Pick<Team, 'name' | 'ageGroup'>): string {
  if (team.ageGroup === 'adult') return team.name;
  return new RegExp(`\\b${team.ageGroup}\\b`, 'i').test(team.name)
    ? team.name
    : `${team.ageGroup} ${team.name}`;
}

/** The team's sessions as an iCalendar document: team, kind, place and times only, never a player. */
export function calendarDocument(
  team: Pick<Team, 'id' | 'name' | 'ageGroup'>,
  sessions: ScheduledSession[],
  timeZone: string,
  publicUrl: string,
  locale: string,
): string {
  const label = teamLabel(team);
  const link = `${publicUrl.replace(/\/$/, '')}/teams/${team.id}`;
  const calendar = ical({
    name: `${label} · Conewise`,
    description: $localize`:a team calendar's description:Training nights and matches of ${label}:team:.`,
    prodId: { company: 'Conewise', product: 'team-calendar', language: 'EN' },
    method: ICalCalendarMethod.PUBLISH,
    ttl: 60 * 60,
  });
  for (const session of sessions) {
    // A match: from the warm-up Conewise plans to kick-off. Training: the session itself.
    const start = zonedMoment(session.date, session.startTime, timeZone).add(
      startOffset(PLAN_KIND_OF[session.kind], session.minutes),
      'minute',
    );
    const match = session.kind === 'match';
    const time = timeInWords(session.startTime, locale);
    calendar.createEvent({
      id: `${session.id}@conewise`,
      start,
      end: start.add(session.minutes, 'minute'),
      timezone: timeZone,
      stamp: session.updatedAt,
      summary: match
        ? $localize`:a match in a team calendar:${label}:team:: match (kick-off ${time}:kickOff:)`
        : $localize`:a training session in a team calendar:${label}:team:: training`,
      description: match
        ? $localize`:a match in a team calendar:Warm-up ${session.minutes}:minutes: minutes before kick-off at ${time}:kickOff:.`
        : $localize`:a training session in a team calendar:Training at ${time}:start:, ${session.minutes}:minutes: minutes.`,
      ...(session.place ? { location: session.place } : {}),
      url: link,
    });
  }
  return calendar.toString();
}

/** A team's calendar feed: its secret address (read by the team's readers, changed by its schedulers) and its document. */
export class CalendarService {
  constructor(private readonly scope: ClubScope) {}

  async get(teamId: string): Promise<TeamCalendarDto> {
    const team = await this.scope.teamToRead(teamId);
    const row = await this.scope.manager.getRepository(TeamCalendar).findOneBy({ teamId: team.id });
    return { path: row ? feedPath(row.token) : null };
  }

  /** Turns the feed on with a new address; an address given out before stops working. */
  async renew(teamId: string): Promise<TeamCalendarDto> {
    const team = await new ScheduleService(this.scope).teamToSchedule(teamId);
    const token = newLinkToken();
    await this.scope.manager
      .getRepository(TeamCalendar)
      .upsert({ teamId: team.id, clubId: this.scope.clubId, token, createdAt: new Date() }, ['teamId']);
    return { path: feedPath(token) };
  }

  /** Turns the feed off: its address answers 404 from now on. */
  async revoke(teamId: string): Promise<void> {
    const team = await new ScheduleService(this.scope).teamToSchedule(teamId);
    await this.scope.manager.getRepository(TeamCalendar).delete({ teamId: team.id });
  }
}

/** The feed behind a secret address, for anyone who has it (no account), or 404; times in the club's locale (CLUB_LOCALE). */
export async function calendarFeed(
  manager: EntityManager,
  token: string,
  publicUrl: string,
  locale: string,
): Promise<string> {
  const feed = await manager.getRepository(TeamCalendar).findOneBy({ token });
  if (!feed) throw notFound('calendar');
  const team = await manager.getRepository(Team).findOneBy({ id: feed.teamId, clubId: feed.clubId });
  if (!team) throw notFound('calendar');
  const zone = await clubTimeZone(manager, team.clubId);
  const sessions = await manager
    .getRepository(ScheduledSession)
    .createQueryBuilder('s')
    .where('s."clubId" = :clubId AND s."teamId" = :teamId', { clubId: team.clubId, teamId: team.id })
    .andWhere('s.date >= :from', { from: addDays(todayIn(zone), -FEED_DAYS_BACK) })
    .orderBy('s.date')
    .addOrderBy('s."startTime"')
    .limit(FEED_LIMIT)
    .getMany();
  return calendarDocument(team, sessions, zone, publicUrl, locale);
}
