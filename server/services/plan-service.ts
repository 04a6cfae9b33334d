import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import type { Page, PlanSummaryDto, SessionPlanDto } from '../../shared/types/api';
import type { Plan } from '../../shared/types/plan';
import type { PlanEdit } from '../../shared/types/plan-edit';
import type { FeedbackFact, PlanRequest, PresentPlayer } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { preparedQuery } from '../db/prepared-query';
import { Player } from '../entities/player';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import { DetailedProblem } from '../http/detailed-problem';
import { badRequest, type FieldError } from '../http/problem';
import type { ClubScope } from './club-scope';
import * as engine from './engine-port';
import { planSummaryDto, sessionPlanDto, sessionPlanJson, type PlanTexts } from './plan-dto';
import { checkPlanShape } from './plan-shape';
import { planActivityIds } from './plan-activity-ids';
import { loadPlanInputs } from './plan-inputs';
import { rulesOfPlan } from './rules-resolver';

export interface CreatePlanInput {
  teamId: string;
  date?: string;
  kickOff?: string;
  /** The scheduled session the plan is for: one of the team's. */
  scheduledSessionId?: string;
  request: PlanRequest;
}

export interface CreatedPlan {
  id: string;
  version: number;
  /** The SessionPlanDto as JSON text. */
  json: string;
}

export interface ListPlansQuery {
  teamId?: string;
  from?: string;
  to?: string;
  page: number;
  pageSize: number;
}

export interface UpdatePlanInput {
  edit?: PlanEdit;
  edits?: PlanEdit[];
  plan?: Plan;
  status?: 'draft' | 'final';
  date?: string | null;
  kickOff?: string | null;
}

/** How many of the team's latest station verdicts the next plan hears about. */
export const RECENT_FEEDBACK_LIMIT = 12;

/** Plans: generate with the club's rules, list, read, edit with engine re-checks. */
export class PlanService {
  constructor(private readonly scope: ClubScope) {}

  /** A new draft, answered as JSON text (see sessionPlanJson) with its id and version for headers. */
  async create(input: CreatePlanInput): Promise<CreatedPlan> {
    const { manager, auth } = this.scope;
    const requestErrors = engine.planRequestErrors(input.request);
    if (requestErrors.length) throw badRequest($localize`The plan request is not valid.`, requestErrors);
    // Team, access, roster, feedback, recent activities, pins and rules in one round trip.
    const inputs = await loadPlanInputs(manager, this.scope, input.teamId, RECENT_FEEDBACK_LIMIT);
    const { team, roster, rules } = inputs;
    if (input.scheduledSessionId)
      await assertSessionOfTeam(manager, auth.clubId, team.id, input.scheduledSessionId);
    const request = requestWithRoster(input.request, roster, inputs);
    const plan = await engine.generatePlan(request, rules);
    // A plain entity: the repository's create() would walk the 22 kB plan for nothing.
    const row = Object.assign(new SessionPlan(), {
      clubId: auth.clubId,
      teamId: team.id,
      date: input.date ?? null,
      kickOff: input.kickOff ?? null,
      scheduledSessionId: input.scheduledSessionId ?? null,
      status: 'draft',
      authorId: auth.userId,
      ...planColumns(plan),
    });
    const texts: PlanTexts = { request: JSON.stringify(row.request), plan: JSON.stringify(row.plan) };
    // The team's pins are for its next plan: this one took them, so they come off with its INSERT.
    const tookPins = !input.request.pinnedActivityIds && inputs.pinnedActivityIds.length > 0;
    await insertPlanRow(manager, row, texts, tookPins ? inputs.pinnedActivityIds : null);
    return { id: row.id, version: row.version, json: sessionPlanJson(row, team.name, texts) };
  }

  async list(query: ListPlansQuery): Promise<Page<PlanSummaryDto>> {
    const { manager, auth } = this.scope;
    const qb = manager
      .getRepository(SessionPlan)
      .createQueryBuilder('p')
      .innerJoin(Team, 't', 't.id = p."teamId"')
      .addSelect('t.name', 'team_name')
      .where('p."clubId" = :clubId', { clubId: auth.clubId });
    if (query.teamId) {
      await this.scope.teamToRead(query.teamId);
      qb.andWhere('p."teamId" = :teamId', { teamId: query.teamId });
    } else if (auth.role === 'assistant') {
      qb.andWhere('p."teamId" IN (SELECT tc."teamId" FROM team_coach tc WHERE tc."userId" = :userId)', {
        userId: auth.userId,
      });
    }
    if (query.from) qb.andWhere('p.date >= :from', { from: query.from });
    if (query.to) qb.andWhere('p.date <= :to', { to: query.to });
    const total = await qb.getCount();
    const { entities, raw } = await qb
      .orderBy('p.date', 'DESC', 'NULLS LAST')
      .addOrderBy('p."createdAt"', 'DESC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize)
      .getRawAndEntities();
    const names = new Map((raw as { p_id: string; team_name: string }[]).map((r) => [r.p_id, r.team_name]));
    return {
      items: entities.map((row) => planSummaryDto(row, names.get(row.id) ?? '')),
      page: query.page,
      pageSize: query.pageSize,
      total,
    };
  }

  async get(id: string): Promise<SessionPlanDto> {
    const row = await this.scope.plan(id);
    const team = await this.scope.teamToRead(row.teamId);
    return sessionPlanDto(row, team.name);
  }

  /** One edit, several edits or a whole edited plan; every result is re-checked against the plan's rules. */
  async update(id: string, input: UpdatePlanInput, ifMatch: number | null): Promise<SessionPlanDto> {
    return this.scope.transaction(async (scope) => {
      const row = await scope.lockedPlan(id);
      const team = await scope.teamToManage(row.teamId);
      if (ifMatch !== null && ifMatch !== row.version) {
        const current = row.version;
        throw new DetailedProblem(
          409,
          $localize`:title of an error answer:Conflict`,
          $localize`The plan changed since version ${ifMatch}:sentVersion:; it is now at version ${current}:currentVersion:. Reload and re-apply.`,
          { currentVersion: row.version },
          undefined,
          '/problems/conflict',
        );
      }
      const rules = await rulesOfPlan(scope.manager, scope.clubId, row.ruleSetId);
      const edits = input.edits ?? (input.edit ? [input.edit] : []);
      let plan = row.plan;
      if (input.plan) plan = await this.replaceWhole(row, input.plan, rules);
      for (const edit of edits) {
        const result = await engine.applyEdit(plan, edit, rules);
        if (result.violations.length) throw violationsProblem(result.violations);
        plan = result.plan;
      }
      if (input.plan || edits.length) Object.assign(row, planColumns(plan));
      if (input.status) row.status = input.status;
      if (input.date !== undefined) row.date = input.date;
      if (input.kickOff !== undefined) row.kickOff = input.kickOff;
      const saved = await scope.manager.getRepository(SessionPlan).save(row);
      return sessionPlanDto(saved, team.name);
    });
  }

  /**
   * Deletes a plan for the lead or a coach of its team (404 outside the club, 403 otherwise). Its
   * attendance and station feedback go with it (ON DELETE CASCADE on both tables).
   */
  async remove(id: string): Promise<void> {
    const row = await this.scope.plan(id);
    await this.scope.teamToManage(row.teamId);
    await this.scope.manager.getRepository(SessionPlan).delete({ id: row.id, clubId: this.scope.clubId });
  }

  /** A whole plan from the client: it keeps the stored request, rules and seed, and must pass the engine's check. */
  private async replaceWhole(row: SessionPlan, sent: Plan, rules: RuleSetDocument): Promise<Plan> {
    const plan: Plan = { ...sent, request: row.plan.request, ruleSet: row.plan.ruleSet, seed: row.plan.seed };
    const shapeErrors = checkPlanShape(plan);
    if (shapeErrors.length) throw badRequest($localize`The edited plan is not a valid plan.`, shapeErrors);
    const violations = await engine.checkPlan(plan, rules);
    if (violations.length) throw violationsProblem(violations);
    return plan;
  }
}

/** 400 unless the scheduled session is one of the team's (a plan is tied to its own team's week only). */
async function assertSessionOfTeam(
  manager: EntityManager,
  clubId: string,
  teamId: string,
  sessionId: string,
): Promise<void> {
  const rows: unknown[] = await manager.query(
    'SELECT 1 FROM scheduled_session WHERE id = $1 AND "teamId" = $2 AND "clubId" = $3',
    [sessionId, teamId, clubId],
  );
  if (!rows.length) {
    throw badRequest($localize`The scheduled session is not one of this team’s.`, [
      {
        field: 'scheduledSessionId',
        message: $localize`:field error after the field's name:is not a session on this team’s schedule`,
      },
    ]);
  }
}

const INSERT_PLAN_SQL = `
INSERT INTO session_plan ("clubId", "teamId", "date", "kickOff", "status", "authorId", "kind", "minutes",
                          "playerCount", "request", "plan", "ruleSetId", "ruleSetVersion", "seed", "activityIds",
                          "version", "scheduledSessionId")
VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10::json, $11::json, $12, $13, $14, $15::varchar[], 1, $16)
RETURNING id, "createdAt", "updatedAt", version`;
// One statement, so one transaction: the plan is stored and the team's pins it took are cleared,
// or neither. Pins changed since they were read stay for the next plan.
const INSERT_PLAN_CLEAR_PINS_SQL = `
WITH unpinned AS (
  UPDATE team SET "pinnedActivityIds" = '{}'
   WHERE id = $2 AND "clubId" = $1 AND "pinnedActivityIds" = $17::varchar[]
)${INSERT_PLAN_SQL}`;

/**
 * One INSERT … RETURNING for a new plan row, filling in its id, timestamps and version: a single
 * new row needs no wrapping transaction or reload, and plain SQL skips the query builder's
 * per-call work on two large JSON columns. With `clearPins`, the same statement takes those pins
 * off the plan's team.
 */
export async function insertPlanRow(
  manager: EntityManager,
  row: SessionPlan,
  texts: PlanTexts,
  clearPins: string[] | null = null,
): Promise<void> {
  const rows = await preparedQuery<Pick<SessionPlan, 'id' | 'createdAt' | 'updatedAt' | 'version'>>(
    manager,
    clearPins ? 'insert-plan-clear-pins' : 'insert-plan',
    clearPins ? INSERT_PLAN_CLEAR_PINS_SQL : INSERT_PLAN_SQL,
    [
      row.clubId,
      row.teamId,
      row.date,
      row.kickOff,
      row.status,
      row.authorId,
      row.kind,
      row.minutes,
      row.playerCount,
      texts.request,
      texts.plan,
      row.ruleSetId,
      row.ruleSetVersion,
      row.seed,
      row.activityIds,
      row.scheduledSessionId ?? null,
      ...(clearPins ? [clearPins] : []),
    ],
  );
  Object.assign(row, rows[0]);
}

/** Columns that follow from a plan. */
export function planColumns(plan: Plan): Partial<SessionPlan> {
  return {
    kind: plan.request.kind,
    minutes: plan.phases.reduce((end, phase) => Math.max(end, phase.endMinute), plan.request.minutes),
    playerCount: plan.request.players.length,
    request: plan.request,
    plan,
    ruleSetId: String(plan.ruleSet.id).slice(0, 64),
    ruleSetVersion: plan.ruleSet.version,
    seed: String(plan.seed).slice(0, 64),
    activityIds: planActivityIds(plan),
  };
}

/**
 * 422 saying, in words, each rule the plan would break (the codes stay in `violations` for
 * programs; they are not fields, so no field errors).
 */
export function violationsProblem(violations: engine.Violation[]): DetailedProblem {
  const said = [...new Set(violations.map((v) => v.message))].join(' ');
  return new DetailedProblem(
    422,
    $localize`:title of an error answer:Plan breaks the club rules`,
    $localize`The change would break the rules this plan was made with: ${said}:brokenRules:`,
    { violations },
    undefined,
    '/problems/rule-violations',
  );
}

/** What the team's history adds to a request that does not bring its own. */
export interface TeamHistory {
  recentFeedback: FeedbackFact[];
  recentActivityIds: string[];
  pinnedActivityIds: string[];
}

/**
 * The request with names and goalkeeper flags from the roster (400 naming each stranger), and the
 * team's recent feedback, recent activities and pins wherever the request brings none of its own.
 */
export function requestWithRoster(
  request: PlanRequest,
  roster: Pick<Player, 'id' | 'displayName' | 'goalkeeper'>[],
  history: TeamHistory,
): PlanRequest {
  const byId = new Map(roster.map((p) => [p.id, p]));
  const errors: FieldError[] = [];
  const players: PresentPlayer[] = request.players.map((p, i) => {
    const known = byId.get(p.id);
    if (!known) {
      errors.push({
        field: `request/players/${i}/id`,
        message: $localize`:field error after the field's name:is not a player of this team`,
      });
      return p;
    }
    return { id: p.id, name: known.displayName, goalkeeper: p.goalkeeper ?? known.goalkeeper };
  });
  if (errors.length) throw badRequest($localize`Some players are not in this team.`, errors);
  const recentFeedback = request.recentFeedback ?? history.recentFeedback;
  const recentActivityIds = request.recentActivityIds ?? history.recentActivityIds;
  const pinnedActivityIds = request.pinnedActivityIds ?? history.pinnedActivityIds;
  return {
    ...request,
    players,
    ...(recentFeedback.length ? { recentFeedback } : {}),
    ...(recentActivityIds.length ? { recentActivityIds } : {}),
    ...(pinnedActivityIds.length ? { pinnedActivityIds } : {}),
  };
}
