import '../../shared/i18n/localize';
import type { EntityManager, EntityTarget, FindOptionsWhere, ObjectLiteral } from 'typeorm';
import { Player } from '../entities/player';
import { RuleSet } from '../entities/rule-set';
import { SessionPlan } from '../entities/session-plan';
import { Team } from '../entities/team';
import type { AuthContext } from '../http/auth-context';
import { forbidden, type Missing, notFound } from '../http/problem';
import { isUuid } from '../../shared/types/uuid';

/** What running a team's session involves, as the refusal names it. */
export type RunningWork = 'take its register' | 'judge its stations' | 'change who is at its session';

/** The refusal for someone not on the team's staff, a whole sentence for each kind of work. */
function onlyItsStaff(doing: RunningWork): string {
  switch (doing) {
    case 'take its register':
      return $localize`Only the head of coaching and the team’s own coaches and assistants can take its register.`;
    case 'judge its stations':
      return $localize`Only the head of coaching and the team’s own coaches and assistants can judge its stations.`;
    case 'change who is at its session':
      return $localize`Only the head of coaching and the team’s own coaches and assistants can change who is at its session.`;
  }
}

/**
 * The one place that ties data to the caller's club. Every service loads club-owned rows by
 * id through here, so another club's id answers 404 and never its data.
 */
export class ClubScope {
  constructor(
    readonly manager: EntityManager,
    readonly auth: AuthContext,
  ) {}

  get clubId(): string {
    return this.auth.clubId;
  }

  /**
   * Runs `work` in one database transaction with the same caller's scope bound to it, so every
   * read and write inside is all-or-nothing. Nested calls join the outer transaction.
   */
  transaction<T>(work: (scope: ClubScope) => Promise<T>): Promise<T> {
    if (this.manager.queryRunner?.isTransactionActive) return work(this);
    return this.manager.transaction((manager) => work(new ClubScope(manager, this.auth)));
  }

  /** A where-clause limited to the caller's club. */
  where<T extends { clubId: string }>(extra: FindOptionsWhere<T> = {}): FindOptionsWhere<T> {
    return { ...extra, clubId: this.clubId } as FindOptionsWhere<T>;
  }

  /** A club-owned row by id, or 404 (also for ids that are not uuids). */
  async byId<T extends ObjectLiteral & { clubId: string }>(
    entity: EntityTarget<T>,
    id: string,
    what: Missing,
  ): Promise<T> {
    if (!isUuid(id)) throw notFound(what);
    const row = await this.manager
      .getRepository(entity)
      .findOne({ where: this.where<T>({ id } as unknown as FindOptionsWhere<T>) });
    if (!row) throw notFound(what);
    return row;
  }

  team(id: string): Promise<Team> {
    return this.byId(Team, id, 'team');
  }

  player(id: string): Promise<Player> {
    return this.byId(Player, id, 'player');
  }

  plan(id: string): Promise<SessionPlan> {
    return this.byId(SessionPlan, id, 'plan');
  }

  /** A plan of the club locked for the rest of the transaction (call inside `transaction`), or 404. */
  async lockedPlan(id: string): Promise<SessionPlan> {
    if (!isUuid(id)) throw notFound('plan');
    const row = await this.manager.getRepository(SessionPlan).findOne({
      where: this.where<SessionPlan>({ id }),
      lock: { mode: 'pessimistic_write' },
    });
    if (!row) throw notFound('plan');
    return row;
  }

  ruleSet(id: string): Promise<RuleSet> {
    return this.byId(RuleSet, id, 'rule set');
  }

  /** Whether the caller is attached to the team as coach or assistant. */
  async isAttached(teamId: string): Promise<boolean> {
    const rows: unknown[] = await this.manager.query(
      'SELECT 1 FROM team_coach WHERE "teamId" = $1 AND "userId" = $2',
      [teamId, this.auth.userId],
    );
    return rows.length > 0;
  }

  /**
   * Whether the caller may change a team's data, given whether they are on its staff: the head of
   * coaching every team, a coach the teams they are attached to, an assistant none.
   */
  canManageWhenAttached(attached: boolean): boolean {
    if (this.auth.role === 'lead') return true;
    if (this.auth.role === 'coach') return attached;
    return false;
  }

  /** 404 when the team is not the club's, 403 when the caller may not change it. */
  assertManageable(team: Team | null, attached: boolean): Team {
    if (!team) throw notFound('team');
    if (!this.canManageWhenAttached(attached))
      throw forbidden($localize`Only the head of coaching and the team’s coaches can change this team.`);
    return team;
  }

  /** A team the caller may change (squad, kit, plans), else 404 / 403. */
  async teamToManage(id: string): Promise<Team> {
    const team = await this.team(id);
    return this.assertManageable(team, this.auth.role === 'coach' && (await this.isAttached(team.id)));
  }

  /**
   * A team whose sessions the caller runs (register, pitch-side records): the lead, or a coach or
   * assistant attached to it; else 404 / 403 saying what they may not do.
   */
  async teamToRun(id: string, doing: RunningWork = 'take its register'): Promise<Team> {
    const team = await this.team(id);
    if (this.auth.role !== 'lead' && !(await this.isAttached(team.id))) throw forbidden(onlyItsStaff(doing));
    return team;
  }

  /** Lead and coaches: any team of the club; assistants: the teams they are attached to. */
  async teamToRead(id: string): Promise<Team> {
    const team = await this.team(id);
    if (this.auth.role === 'assistant' && !(await this.isAttached(team.id))) {
      throw forbidden($localize`Assistants see the teams they help with.`);
    }
    return team;
  }
}
