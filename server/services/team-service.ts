import '../../shared/i18n/localize';
import { In, type EntityManager } from 'typeorm';
import type { Role, TeamDto } from '../../shared/types/api';
import { staffChangeRefusal } from '../../shared/types/team-staff';
import type { AgeGroup, Level, Space } from '../../shared/types/plan-request';
import { KitBag } from '../entities/kit-bag';
import { Membership } from '../entities/membership';
import { Team } from '../entities/team';
import { preparedQuery } from '../db/prepared-query';
import { badRequest, forbidden, notFound } from '../http/problem';
import type { ClubScope } from './club-scope';

export interface TeamInput {
  name: string;
  ageGroup: AgeGroup;
  level: Level;
  usualSpace: Space;
  coachIds?: string[];
}

interface TeamListRow extends Omit<TeamDto, 'usualSpace'> {
  spaceWidth: number;
  spaceLength: number;
}

// The home page's list in one round trip: the club's teams (an assistant's own only) with their
// staff and active-player counts, in the order toDtos gives.
const TEAM_LIST_SQL = `
SELECT t.id, t.name, t."ageGroup", t.level, t."spaceWidth", t."spaceLength", t."pinnedActivityIds",
       coalesce((SELECT array_agg(tc."userId"::text ORDER BY tc."userId")
                   FROM team_coach tc WHERE tc."teamId" = t.id), '{}'::text[]) AS "coachIds",
       (SELECT count(*)::int FROM player p WHERE p."teamId" = t.id AND p.active) AS "playerCount"
  FROM team t
 WHERE t."clubId" = $1
   AND ($2::uuid IS NULL
        OR EXISTS (SELECT 1 FROM team_coach tc WHERE tc."teamId" = t.id AND tc."userId" = $2::uuid))
 ORDER BY t.name`;

/** The members on a team's staff (coaches and assistants). */
async function staffOf(manager: EntityManager, teamId: string): Promise<string[]> {
  const rows: { userId: string }[] = await manager.query(
    'SELECT "userId"::text AS "userId" FROM team_coach WHERE "teamId" = $1',
    [teamId],
  );
  return rows.map((row) => row.userId);
}

/** Makes the team's staff exactly these members, in the caller's transaction. */
async function replaceStaff(manager: EntityManager, teamId: string, userIds: string[]): Promise<void> {
  await manager.query('DELETE FROM team_coach WHERE "teamId" = $1', [teamId]);
  if (!userIds.length) return;
  await manager.query(
    'INSERT INTO team_coach ("teamId", "userId") SELECT $1, unnest($2::uuid[]) ON CONFLICT DO NOTHING',
    [teamId, userIds],
  );
}

/** Squads of the caller's club. */
export class TeamService {
  constructor(private readonly scope: ClubScope) {}

  private get manager() {
    return this.scope.manager;
  }

  /** Lead and coaches see every team; assistants the teams they help with. */
  async list(): Promise<TeamDto[]> {
    const helper = this.scope.auth.role === 'assistant' ? this.scope.auth.userId : null;
    const rows = await preparedQuery<TeamListRow>(this.manager, 'team-list', TEAM_LIST_SQL, [
      this.scope.clubId,
      helper,
    ]);
    return rows.map(({ spaceWidth, spaceLength, ...team }) => ({
      ...team,
      usualSpace: { width: spaceWidth, length: spaceLength },
    }));
  }

  async get(id: string): Promise<TeamDto> {
    const [dto] = await this.toDtos([await this.scope.teamToRead(id)]);
    return dto!;
  }

  /** The team, its staff and its empty kit bag in one transaction: all of it or nothing. */
  async create(input: TeamInput): Promise<TeamDto> {
    const auth = this.scope.auth;
    if (auth.role === 'assistant') throw forbidden($localize`Assistants cannot create teams.`);
    const staffIds = [...new Set(input.coachIds ?? [])];
    if (auth.role === 'coach' && !staffIds.includes(auth.userId)) staffIds.unshift(auth.userId);
    const roles = await this.staffRoles(staffIds, 'coachIds');
    // A coach creating a team is its first staff member; who else they may attach follows the rule.
    this.assertStaffChanges(auth.role === 'coach' ? [auth.userId] : [], roles, staffIds, []);
    const id = await this.manager.transaction(async (manager) => {
      const team = await manager.getRepository(Team).save({
        clubId: this.scope.clubId,
        name: input.name.trim(),
        ageGroup: input.ageGroup,
        level: input.level,
        spaceWidth: input.usualSpace.width,
        spaceLength: input.usualSpace.length,
      });
      await replaceStaff(manager, team.id, staffIds);
      await manager
        .getRepository(KitBag)
        .save({ teamId: team.id, clubId: this.scope.clubId, balls: 0, cones: 0, bibs: 0, goals: 0 });
      return team.id;
    });
    return this.get(id);
  }

  /** The team's details and, when `coachIds` is given, its whole staff, in one transaction. */
  async update(id: string, input: Partial<TeamInput>): Promise<TeamDto> {
    const team = await this.scope.teamToManage(id);
    if (input.name !== undefined) team.name = input.name.trim();
    if (input.ageGroup !== undefined) team.ageGroup = input.ageGroup;
    if (input.level !== undefined) team.level = input.level;
    if (input.usualSpace !== undefined) {
      team.spaceWidth = input.usualSpace.width;
      team.spaceLength = input.usualSpace.length;
    }
    let staffIds: string[] | null = null;
    if (input.coachIds !== undefined) {
      staffIds = [...new Set(input.coachIds)];
      const current = await staffOf(this.manager, team.id);
      const added = staffIds.filter((userId) => !current.includes(userId));
      const removed = current.filter((userId) => !staffIds!.includes(userId));
      const roles = await this.staffRoles([...added, ...removed], 'coachIds');
      this.assertStaffChanges(current, roles, added, removed);
    }
    await this.manager.transaction(async (manager) => {
      await manager.getRepository(Team).save(team);
      if (staffIds) await replaceStaff(manager, team.id, staffIds);
    });
    return this.get(team.id);
  }

  /** Puts a member of the club on the team's staff; already there is no change. */
  async addStaff(teamId: string, userId: string): Promise<TeamDto> {
    const team = await this.scope.team(teamId);
    const current = await staffOf(this.manager, team.id);
    const roles = await this.staffRoles([userId], null);
    this.assertStaffChanges(current, roles, [userId], []);
    await this.manager.query(
      'INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2) ON CONFLICT DO NOTHING',
      [team.id, userId],
    );
    return this.get(team.id);
  }

  /** Takes a member off the team's staff; not on it is no change. */
  async removeStaff(teamId: string, userId: string): Promise<TeamDto> {
    const team = await this.scope.team(teamId);
    const current = await staffOf(this.manager, team.id);
    const roles = await this.staffRoles([userId], null);
    this.assertStaffChanges(current, roles, [], [userId]);
    await this.manager.query('DELETE FROM team_coach WHERE "teamId" = $1 AND "userId" = $2', [
      team.id,
      userId,
    ]);
    return this.get(team.id);
  }

  async remove(id: string): Promise<void> {
    const team = await this.scope.teamToManage(id);
    await this.manager.getRepository(Team).delete({ id: team.id, clubId: this.scope.clubId });
  }

  /**
   * The club roles of the given members. Someone who is not a member of this club is refused: as a
   * bad `field` of a body, or as an unknown member (404) when named in the path (`field` null).
   */
  private async staffRoles(userIds: string[], field: string | null): Promise<Map<string, Role>> {
    if (!userIds.length) return new Map();
    const members = await this.manager
      .getRepository(Membership)
      .findBy({ clubId: this.scope.clubId, userId: In(userIds) });
    const roles = new Map(members.map((m) => [m.userId, m.role]));
    if (userIds.some((userId) => !roles.has(userId))) {
      if (!field) throw notFound('member');
      throw badRequest($localize`Someone picked for this team is not a member of the club.`, [
        { field, message: $localize`Pick coaches and assistants from the club’s members.` },
      ]);
    }
    return roles;
  }

  /** 403 with the reason when the caller may not make one of these staff changes. */
  private assertStaffChanges(
    current: readonly string[],
    roles: Map<string, Role>,
    added: readonly string[],
    removed: readonly string[],
  ): void {
    const caller = { id: this.scope.auth.userId, role: this.scope.auth.role };
    const changes = [
      ...added.map((userId) => ({ userId, change: 'add' as const })),
      ...removed.map((userId) => ({ userId, change: 'remove' as const })),
    ];
    for (const { userId, change } of changes) {
      const member = { userId, role: roles.get(userId) ?? 'assistant' };
      const refusal = staffChangeRefusal(caller, current, member, change);
      if (refusal) throw forbidden(refusal);
    }
  }

  async toDtos(teams: Team[]): Promise<TeamDto[]> {
    if (!teams.length) return [];
    const ids = teams.map((t) => t.id);
    // Staff and active-player counts for all the teams in one round trip.
    const extras: { teamId: string; coachIds: string[]; playerCount: string }[] = await this.manager.query(
      `SELECT t.id AS "teamId",
              coalesce((SELECT array_agg(tc."userId"::text ORDER BY tc."userId")
                          FROM team_coach tc WHERE tc."teamId" = t.id), '{}'::text[]) AS "coachIds",
              (SELECT count(*) FROM player p WHERE p."teamId" = t.id AND p.active) AS "playerCount"
         FROM unnest($1::uuid[]) AS t(id)`,
      [ids],
    );
    const byTeam = new Map(extras.map((e) => [e.teamId, e]));
    return teams.map((team) => ({
      id: team.id,
      name: team.name,
      ageGroup: team.ageGroup,
      level: team.level,
      usualSpace: { width: team.spaceWidth, length: team.spaceLength },
      coachIds: byTeam.get(team.id)?.coachIds ?? [],
      playerCount: Number(byTeam.get(team.id)?.playerCount ?? 0),
      pinnedActivityIds: team.pinnedActivityIds ?? [],
    }));
  }
}
