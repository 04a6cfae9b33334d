import '../../shared/i18n/localize';
import { In } from 'typeorm';
import type { StationVerdict } from '../../shared/types/plan-edit';
import type { PlanChangeDto } from '../../shared/types/plan-api';
import type { PresentPlayer } from '../../shared/types/plan-request';
import { Player } from '../entities/player';
import { SessionPlan } from '../entities/session-plan';
import { badRequest, type FieldError } from '../http/problem';
import type { ClubScope } from './club-scope';
import * as engine from './engine-port';
import { storeFeedback, stationOf } from './feedback-service';
import { feedbackDto, sessionPlanDto } from './plan-dto';
import { planColumns } from './plan-service';
import { rulesOfPlan } from './rules-resolver';

export interface ReplanInput {
  add?: (string | PresentPlayer)[];
  remove?: string[];
  fromMinute: number;
}

export interface ProgressionInput {
  phaseIndex: number;
  stationId: string;
  verdict: StationVerdict;
  note?: string;
  clientId?: string;
}

/** Changes while the session runs: arrivals and leavers, and too easy / too hard on a station. */
export class PitchSideService {
  constructor(private readonly scope: ClubScope) {}

  /**
   * Re-plans the remaining phases. Adding someone already there or removing someone already gone
   * does nothing, so a replayed offline action changes the plan once.
   */
  async replan(planId: string, input: ReplanInput): Promise<PlanChangeDto> {
    return this.scope.transaction(async (scope) => {
      const row = await scope.lockedPlan(planId);
      const team = await scope.teamToRun(row.teamId, 'change who is at its session');
      const present = new Set(row.plan.request.players.map((p) => p.id));
      const addIds = (input.add ?? []).map((a) => (typeof a === 'string' ? a : a.id));
      const roster = addIds.length
        ? await scope.manager
            .getRepository(Player)
            .find({ where: { id: In(addIds), teamId: row.teamId, clubId: scope.clubId } })
        : [];
      const byId = new Map(roster.map((p) => [p.id, p]));
      const errors: FieldError[] = [];
      addIds.forEach((id, i) => {
        if (!byId.has(id))
          errors.push({
            field: `add/${i}`,
            message: $localize`:field error after the field's name:is not a player of this team`,
          });
      });
      if (errors.length) throw badRequest($localize`Some arrivals are not in this team.`, errors);
      const add: PresentPlayer[] = [...new Set(addIds)]
        .filter((id) => !present.has(id))
        .map((id) => ({ id, name: byId.get(id)!.displayName, goalkeeper: byId.get(id)!.goalkeeper }));
      const remove = [...new Set(input.remove ?? [])].filter((id) => present.has(id));
      if (!add.length && !remove.length) return { plan: sessionPlanDto(row, team.name), moves: [] };
      if (present.size + add.length - remove.length < 1) {
        throw badRequest($localize`A plan needs at least one player.`, [
          { field: 'remove', message: $localize`:field error after the field's name:would leave nobody` },
        ]);
      }
      const rules = await rulesOfPlan(scope.manager, scope.clubId, row.ruleSetId);
      const result = await engine.replan(row.plan, { add, remove, fromMinute: input.fromMinute }, rules);
      Object.assign(row, planColumns(result.plan));
      const saved = await scope.manager.getRepository(SessionPlan).save(row);
      return { plan: sessionPlanDto(saved, team.name), moves: result.moves };
    });
  }

  /** Applies the station's progression step and stores the verdict once per clientId. */
  async progression(planId: string, input: ProgressionInput): Promise<PlanChangeDto> {
    return this.scope.transaction(async (scope) => {
      const row = await scope.lockedPlan(planId);
      const team = await scope.teamToRun(row.teamId, 'judge its stations');
      const station = stationOf(row.plan, input.phaseIndex, input.stationId);
      const { feedback, created } = await storeFeedback(scope.manager, scope.auth, row, station, input);
      if (!created || input.verdict === 'right') {
        return { plan: sessionPlanDto(row, team.name), moves: [], feedback: feedbackDto(feedback) };
      }
      const rules = await rulesOfPlan(scope.manager, scope.clubId, row.ruleSetId);
      const plan = await engine.applyProgression(row.plan, input, rules);
      Object.assign(row, planColumns(plan));
      const saved = await scope.manager.getRepository(SessionPlan).save(row);
      return { plan: sessionPlanDto(saved, team.name), moves: [], feedback: feedbackDto(feedback) };
    });
  }
}
