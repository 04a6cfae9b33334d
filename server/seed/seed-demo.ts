import type { DataSource, EntityManager } from 'typeorm';
import type { Plan } from '../../shared/types/plan';
import type { PlanRequest } from '../../shared/types/plan-request';
import { Attendance } from '../entities/attendance';
import { Club } from '../entities/club';
import { KitBag } from '../entities/kit-bag';
import { Membership } from '../entities/membership';
import { Player } from '../entities/player';
import { ScheduledSession } from '../entities/scheduled-session';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import { User } from '../entities/user';
import { hashPassword } from '../services/auth-service';
import { todayIn } from '../services/local-time';
import { planActivityIds } from '../services/plan-activity-ids';
import { addDays } from '../../shared/types/schedule';
import {
  DEMO_CLUB,
  DEMO_PASSWORD,
  DEMO_PEOPLE,
  DEMO_SCHEDULE_WEEKS,
  DEMO_TEAMS,
  type DemoTeam,
} from './demo-data';

type PlanGenerator = (request: PlanRequest) => Promise<Plan>;

/** The team's week from today on, in the club's zone, for DEMO_SCHEDULE_WEEKS weeks. */
function demoSchedule(team: Team, spec: DemoTeam, timeZone: string): Partial<ScheduledSession>[] {
  const today = todayIn(timeZone);
  const weekday = new Date(`${today}T12:00:00Z`).getUTCDay();
  return spec.week.flatMap((entry) =>
    Array.from({ length: DEMO_SCHEDULE_WEEKS }, (_, week) => ({
      clubId: team.clubId,
      teamId: team.id,
      date: addDays(today, ((entry.weekday - weekday + 7) % 7) + 7 * week),
      startTime: entry.startTime,
      kind: entry.kind,
      minutes: entry.minutes,
      place: entry.place,
    })),
  );
}

/** The engine through the server's doorway, or null while engine/ does not generate yet. */
async function loadGenerator(log: (m: string) => void): Promise<PlanGenerator | null> {
  try {
    const port = await import('../services/engine-port');
    const rules = port.defaultRules();
    return (request) => port.generatePlan(request, rules);
  } catch (error) {
    log(`[conewise] demo: no past plans, the engine is not available yet (${(error as Error).message})`);
    return null;
  }
}

function isoDay(daysAgo: number): string {
  const day = new Date(Date.now() - daysAgo * 86_400_000);
  return day.toISOString().slice(0, 10);
}

async function seedPastPlans(
  manager: EntityManager,
  generate: PlanGenerator,
  team: Team,
  spec: DemoTeam,
  players: Player[],
  authorId: string,
  log: (m: string) => void,
): Promise<number> {
  let made = 0;
  for (const [index, past] of spec.pastPlans.entries()) {
    // A different few stay home each time; deterministic so a reseed looks the same.
    const present = players.filter((_, i) => (i + index) % players.length < past.present);
    const seed = `demo-${spec.name}-${past.daysAgo}`.replace(/\s+/g, '-').toLowerCase();
    const request: PlanRequest = {
      ageGroup: spec.ageGroup,
      level: spec.level,
      players: present.map((p) => ({ id: p.id, name: p.displayName, goalkeeper: p.goalkeeper })),
      coaches: spec.staff.length,
      equipment: spec.kit,
      space: spec.usualSpace,
      minutes: past.minutes,
      kind: past.kind,
      seed,
    };
    let plan: Plan;
    try {
      plan = await generate(request);
    } catch (error) {
      log(`[conewise] demo: skipped a past plan for ${spec.name}: ${(error as Error).message}`);
      continue;
    }
    const saved = await manager.getRepository(SessionPlan).save({
      clubId: team.clubId,
      teamId: team.id,
      date: isoDay(past.daysAgo),
      kickOff: past.kickOff,
      kind: past.kind,
      minutes: past.minutes,
      playerCount: present.length,
      request,
      plan,
      ruleSetId: plan.ruleSet?.id ?? 'default',
      ruleSetVersion: plan.ruleSet?.version ?? 1,
      seed: plan.seed ?? seed,
      activityIds: planActivityIds(plan),
      status: 'final',
      authorId,
    });
    await manager.getRepository(Attendance).save(
      present.map((p) => ({
        clubId: team.clubId,
        planId: saved.id,
        playerId: p.id,
        recordedById: authorId,
      })),
    );
    made++;
  }
  return made;
}

/** Whether the demo club is already there (its lead's e-mail exists). */
export async function demoSeeded(dataSource: DataSource): Promise<boolean> {
  return dataSource.getRepository(User).existsBy({ email: DEMO_PEOPLE[0]!.email });
}

/**
 * Seeds the demo club once; a second call does nothing, except adding the past plans when an
 * earlier run had no engine to make them. Returns whether it seeded anything.
 */
export async function seedDemo(
  dataSource: DataSource,
  log: (m: string) => void = console.log,
): Promise<boolean> {
  const generate = await loadGenerator(log);
  if (await demoSeeded(dataSource)) return generate ? seedMissingPlans(dataSource, generate, log) : false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  let plans = 0;
  await dataSource.transaction(async (manager) => {
    const club = await manager.getRepository(Club).save({ name: DEMO_CLUB });
    const users = new Map<string, User>();
    for (const person of DEMO_PEOPLE) {
      const user = await manager
        .getRepository(User)
        .save({ email: person.email, name: person.name, passwordHash, emailVerifiedAt: new Date() });
      await manager.getRepository(Membership).save({ clubId: club.id, userId: user.id, role: person.role });
      users.set(person.email, user);
    }
    for (const spec of DEMO_TEAMS) {
      const team = await manager.getRepository(Team).save({
        clubId: club.id,
        name: spec.name,
        ageGroup: spec.ageGroup,
        level: spec.level,
        spaceWidth: spec.usualSpace.width,
        spaceLength: spec.usualSpace.length,
      });
      for (const email of spec.staff) {
        await manager.query('INSERT INTO team_coach ("teamId", "userId") VALUES ($1, $2)', [
          team.id,
          users.get(email)!.id,
        ]);
      }
      await manager.getRepository(KitBag).save({ teamId: team.id, clubId: club.id, ...spec.kit });
      await manager
        .getRepository(ScheduledSession)
        .save(demoSchedule(team, spec, club.timeZone ?? 'Europe/London'));
      const players = await manager.getRepository(Player).save(
        spec.players.map((p) => ({
          clubId: club.id,
          teamId: team.id,
          displayName: p.displayName,
          goalkeeper: p.goalkeeper ?? false,
          active: true,
        })),
      );
      if (generate) {
        const author = users.get(spec.staff[0]!)!;
        plans += await seedPastPlans(manager, generate, team, spec, players, author.id, log);
      }
    }
  });
  log(
    `[conewise] demo club “${DEMO_CLUB}” seeded: ${DEMO_PEOPLE.length} people, ${DEMO_TEAMS.length} teams, ${plans} past plans`,
  );
  return true;
}

async function seedMissingPlans(
  dataSource: DataSource,
  generate: PlanGenerator,
  log: (m: string) => void,
): Promise<boolean> {
  const lead = await dataSource.getRepository(User).findOneByOrFail({ email: DEMO_PEOPLE[0]!.email });
  const membership = await dataSource.getRepository(Membership).findOneBy({ userId: lead.id });
  if (!membership) return false;
  if (await dataSource.getRepository(SessionPlan).existsBy({ clubId: membership.clubId })) return false;
  let plans = 0;
  await dataSource.transaction(async (manager) => {
    for (const spec of DEMO_TEAMS) {
      const team = await manager
        .getRepository(Team)
        .findOneBy({ clubId: membership.clubId, name: spec.name });
      if (!team) continue;
      const players = await manager
        .getRepository(Player)
        .find({ where: { teamId: team.id }, order: { createdAt: 'ASC' } });
      const author = await manager.getRepository(User).findOneBy({ email: spec.staff[0]! });
      plans += await seedPastPlans(manager, generate, team, spec, players, author?.id ?? lead.id, log);
    }
  });
  if (plans) log(`[conewise] demo: added ${plans} past plans`);
  return plans > 0;
}
