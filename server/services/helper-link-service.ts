import '../../shared/i18n/localize';
import type { DataSource, EntityManager } from 'typeorm';
import { IsNull } from 'typeorm';
import type { Phase, Station, StationRoles } from '../../shared/types/plan';
import type { CreatedHelperLinkDto, HelperLinkDto, HelperViewDto } from '../../shared/types/helper-view';
import type { AppConfig } from '../config';
import { HelperLink } from '../entities/helper-link';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import { conflict, forbidden, HttpError, notFound } from '../http/problem';
import { formerMember } from './account-erasure';
import type { ClubScope } from './club-scope';
import { firstNames } from './first-names';
import { clubTimeZone } from './schedule-service';
import { expiryInWords, helperLinkExpiry } from './session-day';
import { hashLinkToken, newLinkToken } from './link-token';
import type { DistanceUnit, TemperatureUnit, Units } from '../../shared/units';
import { unitsOf } from './unit-settings';
import { isUuid } from '../../shared/types/uuid';

/** 32 random bytes in base64url: 43 characters. */
const TOKEN = /^[A-Za-z0-9_-]{43}$/;

/** The address a helper opens: the token rides in the fragment, which browsers never send to a server. */
export function helperLinkUrl(config: AppConfig, token: string): string {
  return `${config.publicUrl.replace(/\/$/, '')}/helper#${token}`;
}

const linkNotKnown = () =>
  new HttpError(
    404,
    $localize`:title of an error answer:Helper link not known`,
    $localize`This link is not known. Check that the whole link was copied, or ask the coach for a new one.`,
    undefined,
    '/problems/helper-link-unknown',
  );

const linkEnded = (detail: string) =>
  new HttpError(
    410,
    $localize`:title of an error answer:Helper link ended`,
    detail,
    undefined,
    '/problems/helper-link-ended',
  );

/** "the end of Wednesday 9 December", in the given locale and the club's time zone. */
async function linkEndInWords(
  manager: EntityManager,
  expiresAt: Date,
  clubId: string,
  locale: string,
): Promise<string> {
  return expiryInWords(expiresAt, locale, await clubTimeZone(manager, clubId));
}

/**
 * Helper links: the team's staff (its coaches and assistants) or the lead make one for a plan,
 * list the live ones and stop them. Reading a plan through a link is HelperViewService's.
 */
export class HelperLinkService {
  constructor(
    private readonly scope: ClubScope,
    private readonly config: AppConfig,
  ) {}

  /** A plan of the caller's club whose team the caller staffs (or any, for the lead); else 404 / 403. */
  private async planForStaff(planId: string): Promise<SessionPlan> {
    const plan = await this.scope.plan(planId);
    if (this.scope.auth.role !== 'lead' && !(await this.scope.isAttached(plan.teamId))) {
      throw forbidden(
        $localize`Only the team’s coaches and assistants and the head of coaching can share helper links.`,
      );
    }
    return plan;
  }

  async create(planId: string): Promise<CreatedHelperLinkDto> {
    const plan = await this.planForStaff(planId);
    const { link, url } = await this.issue(plan, 0);
    return { ...toDto(link, this.scope.auth.name), url };
  }

  /** When a link made now for the plan would stop working; null when that is already past. */
  async expiryFor(plan: SessionPlan, now = new Date()): Promise<Date | null> {
    const zone = await clubTimeZone(this.scope.manager, plan.clubId);
    const expiresAt = helperLinkExpiry(plan.date, now, zone);
    return expiresAt > now ? expiresAt : null;
  }

  /** "the end of Wednesday 9 December", in the given locale and the club's time zone. */
  expiryWords(expiresAt: Date, locale: string): Promise<string> {
    return linkEndInWords(this.scope.manager, expiresAt, this.scope.clubId, locale);
  }

  /**
   * Stores a new link, made by the caller, for a plan whose permission the caller has checked (in
   * the scope's transaction, if it has one). 409 when the session was more than a day ago (the
   * link would be dead at once).
   */
  async issue(plan: SessionPlan, emailedTo: number): Promise<{ link: HelperLink; url: string }> {
    const expiresAt = await this.expiryFor(plan);
    if (!expiresAt) {
      throw conflict(
        $localize`This session is more than a day ago, and a helper link only works until the end of the day after the session.`,
      );
    }
    const token = newLinkToken();
    const repo = this.scope.manager.getRepository(HelperLink);
    const link = await repo.save(
      repo.create({
        planId: plan.id,
        clubId: plan.clubId,
        tokenHash: hashLinkToken(token),
        createdBy: this.scope.auth.userId,
        emailedTo,
        expiresAt,
        revokedAt: null,
      }),
    );
    return { link, url: helperLinkUrl(this.config, token) };
  }

  /** The plan's links that still work, newest first. */
  async list(planId: string): Promise<HelperLinkDto[]> {
    const plan = await this.planForStaff(planId);
    const rows: (HelperLink & { createdByName: string | null })[] = await this.scope.manager.query(
      `SELECT link.*, maker.name AS "createdByName"
         FROM helper_link link LEFT JOIN app_user maker ON maker.id = link."createdBy"
        WHERE link."planId" = $1 AND link."clubId" = $2 AND link."revokedAt" IS NULL AND link."expiresAt" > now()
        ORDER BY link."createdAt" DESC`,
      [plan.id, plan.clubId],
    );
    return rows.map((row) => toDto(row, row.createdByName ?? formerMember()));
  }

  /** Stops a link at once; stopping it twice is harmless. */
  async revoke(planId: string, linkId: string): Promise<void> {
    const plan = await this.planForStaff(planId);
    if (!isUuid(linkId)) throw notFound('helper link');
    const repo = this.scope.manager.getRepository(HelperLink);
    const result = await repo.update(
      { id: linkId, planId: plan.id, clubId: plan.clubId, revokedAt: IsNull() },
      { revokedAt: new Date() },
    );
    if (!result.affected) {
      const exists = await repo.exists({ where: { id: linkId, planId: plan.id, clubId: plan.clubId } });
      if (!exists) throw notFound('helper link');
    }
  }
}

/** Anyone holding a live helper link, signed in or not, reads the plan as a helper needs it. */
export class HelperViewService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
  ) {}

  /** The plan behind a live link, reduced to what a helper needs; 404 unknown, 410 ended. */
  async view(token: string | undefined): Promise<HelperViewDto> {
    if (!token || !TOKEN.test(token)) throw linkNotKnown();
    const link = await this.dataSource
      .getRepository(HelperLink)
      .findOne({ where: { tokenHash: hashLinkToken(token) } });
    if (!link) throw linkNotKnown();
    if (link.revokedAt) {
      throw linkEnded(
        $localize`The coach has stopped this link. Ask them for a new one if you are still helping.`,
      );
    }
    if (link.expiresAt <= new Date()) {
      const when = await linkEndInWords(
        this.dataSource.manager,
        link.expiresAt,
        link.clubId,
        this.config.locale,
      );
      throw linkEnded(
        $localize`This link stopped working at ${when}:when:. Ask the coach for a new one if you need it.`,
      );
    }
    const plan = await this.dataSource
      .getRepository(SessionPlan)
      .findOne({ where: { id: link.planId, clubId: link.clubId } });
    const team = plan
      ? await this.dataSource.getRepository(Team).findOne({ where: { id: plan.teamId, clubId: link.clubId } })
      : null;
    if (!plan || !team) throw linkNotKnown();
    return helperView(plan, team.name, link.expiresAt, await this.linkUnits(link));
  }

  /**
   * The units a helper reads: those of the coach who made the link (what they saw when they
   * shared it: their own choice, else the club's), or the club's once they have left the club.
   */
  private async linkUnits(link: HelperLink): Promise<Units> {
    const rows: {
      clubDistance: DistanceUnit;
      clubTemperature: TemperatureUnit;
      ownDistance: DistanceUnit | null;
      ownTemperature: TemperatureUnit | null;
    }[] = await this.dataSource.query(
      `SELECT club."distanceUnit" AS "clubDistance", club."temperatureUnit" AS "clubTemperature",
              maker."distanceUnit" AS "ownDistance", maker."temperatureUnit" AS "ownTemperature"
         FROM club
         LEFT JOIN membership member ON member."clubId" = club.id AND member."userId" = $2
         LEFT JOIN app_user maker ON maker.id = member."userId"
        WHERE club.id = $1`,
      [link.clubId, link.createdBy],
    );
    const row = rows[0];
    if (!row) throw linkNotKnown();
    return unitsOf(
      { distanceUnit: row.clubDistance, temperatureUnit: row.clubTemperature },
      { distanceUnit: row.ownDistance, temperatureUnit: row.ownTemperature },
    ).units;
  }
}

function toDto(link: HelperLink, createdByName: string | null): HelperLinkDto {
  return {
    id: link.id,
    planId: link.planId,
    createdAt: link.createdAt.toISOString(),
    expiresAt: link.expiresAt.toISOString(),
    createdByName,
    emailedTo: link.emailedTo,
  };
}

/**
 * The plan with each player id replaced by a stand-in (h1, h2 …) and each name cut to the first
 * name; the request, rules, trace, touches and warnings stay behind.
 */
export function helperView(row: SessionPlan, teamName: string, expiresAt: Date, units: Units): HelperViewDto {
  const players = row.plan.request.players;
  const first = firstNames(players.map((p) => p.name));
  const aliases = new Map<string, string>();
  const names: Record<string, string> = {};
  players.forEach((player, i) => {
    const alias = `h${i + 1}`;
    aliases.set(player.id, alias);
    names[alias] = first[i]!;
  });
  const alias = (id: string): string => {
    if (id === 'coach') return id;
    let known = aliases.get(id);
    if (!known) {
      known = `h${aliases.size + 1}`;
      aliases.set(id, known);
      names[known] =
        $localize`:a player in a helper's view of a plan, who is not named:Player ${aliases.size}:number:`;
    }
    return known;
  };
  const phases: Phase[] = row.plan.phases.map((phase) => ({
    ...phase,
    stations: phase.stations.map((station) => helperStation(station, alias)),
  }));
  return {
    teamName,
    kind: row.kind,
    date: row.date,
    kickOff: row.kickOff,
    minutes: row.minutes,
    playerCount: row.playerCount,
    phases,
    cautions: row.plan.cautions,
    names,
    expiresAt: expiresAt.toISOString(),
    units,
  };
}

function helperStation(station: Station, alias: (id: string) => string): Station {
  const roles: StationRoles = {};
  for (const [key, ids] of Object.entries(station.roles) as [keyof StationRoles, unknown][]) {
    if (key === 'teams') {
      const [a, b] = ids as [string[], string[]];
      roles.teams = [a.map(alias), b.map(alias)];
    } else {
      roles[key] = (ids as string[]).map(alias);
    }
  }
  return {
    ...station,
    playerIds: station.playerIds.map(alias),
    roles,
    positions: station.positions.map((p) => ({ ...p, id: alias(p.id) })),
  };
}
