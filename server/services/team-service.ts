import { In } from 'typeorm';
import type { TeamDto } from '../../shared/types/api';
import type { AgeGroup, Level, Space } from '../../shared/types/plan-request';
import { KitBag } from '../entities/kit-bag';
import { Membership } from '../entities/membership';
import { Team } from '../entities/team';
import { preparedQuery } from '../db/prepared-query';
import { badRequest, forbidden } from '../http/problem';
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

  async create(input: TeamInput): Promise<TeamDto> {
    const auth = this.scope.auth;
    if (auth.role === 'assistant') throw forbidden('Assistants cannot create teams.');
    const coachIds = new Set(input.coachIds ?? []);
    if (auth.role === 'coach') coachIds.add(auth.userId);
    await this.checkStaff([...coachIds]);
    const team = await this.manager.getRepository(Team).save({
      clubId: this.scope.clubId,
      name: input.name.trim(),
      ageGroup: input.ageGroup,
      level: input.level,
      spaceWidth: input.usualSpace.width,
      spaceLength: input.usualSpace.length,
    });
    await this.setStaff(team.id, [...coachIds]);
    await this.manager
      .getRepository(KitBag)
      .save({ teamId: team.id, clubId: this.scope.clubId, balls: 0, cones: 0, bibs: 0, goals: 0 });
    return this.get(team.id);
  }

  async update(id: string, input: Partial<TeamInput>): Promise<TeamDto> {
    const team = await this.scope.teamToManage(id);
    if (input.name !== undefined) team.name = input.name.trim();
    if (input.ageGroup !== undefined) team.ageGroup = input.ageGroup;
    if (input.level !== undefined) team.level = input.level;
    if (input.usualSpace !== undefined) {
      team.spaceWidth = input.usualSpace.width;
      team.spaceLength = input.usualSpace.length;
    }
    await this.manager.getRepository(Team).save(team);
    if (input.coachIds !== undefined) {
      const coachIds = [...new Set(input.coachIds)];
      // A coach cannot take themselves off their own team; the lead can.
      if (this.scope.auth.role === 'coach' && !coachIds.includes(this.scope.auth.userId)) {
        coachIds.push(this.scope.auth.userId);
      }
      await this.checkStaff(coachIds);
      await this.setStaff(team.id, coachIds);
    }
    return this.get(team.id);
  }

  async remove(id: string): Promise<void> {
    const team = await this.scope.teamToManage(id);
    await this.manager.getRepository(Team).delete({ id: team.id, clubId: this.scope.clubId });
  }

  /** Staff must be members of this club (coaches or assistants; the lead may attach too). */
  private async checkStaff(userIds: string[]): Promise<void> {
    if (!userIds.length) return;
    const members = await this.manager
      .getRepository(Membership)
      .findBy({ clubId: this.scope.clubId, userId: In(userIds) });
    const known = new Set(members.map((m) => m.userId));
    const unknown = userIds.filter((id) => !known.has(id));
    if (unknown.length) {
      throw badRequest('Some coaches are not members of this club.', [
        { field: 'coachIds', message: `not members of this club: ${unknown.join(', ')}` },
      ]);
    }
  }

  private async setStaff(teamId: string, userIds: string[]): Promise<void> {
    await this.manager.query('DELETE FROM team_coach WHERE "teamId" = $1', [teamId]);
    for (const userId of userIds) {
      await this.manager.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
        teamId,
        userId,
      ]);
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
