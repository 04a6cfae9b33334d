import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import type { FeedbackDto, FeedbackVerdict } from '../../shared/types/api';
import type { Plan, Station } from '../../shared/types/plan';
import { Feedback } from '../entities/feedback';
import type { SessionPlan } from '../entities/session-plan';
import type { AuthContext } from '../http/auth-context';
import { badRequest } from '../http/problem';
import type { ClubScope } from './club-scope';
import { feedbackDto } from './plan-dto';

export interface FeedbackInput {
  stationId: string;
  phaseIndex: number;
  verdict: FeedbackVerdict;
  note?: string;
  clientId?: string;
}

/** The station a verdict is about, or 400 naming the field that does not match the plan. */
export function stationOf(plan: Plan, phaseIndex: number, stationId: string): Station {
  const phase = plan.phases[phaseIndex];
  if (!phase)
    throw badRequest($localize`No such phase in this plan.`, [
      {
        field: 'phaseIndex',
        message: $localize`:field error after the field's name:is not a phase of this plan`,
      },
    ]);
  const station = phase.stations.find((s) => s.id === stationId);
  if (!station) {
    throw badRequest($localize`No such station in that phase.`, [
      {
        field: 'stationId',
        message: $localize`:field error after the field's name:is not a station of that phase`,
      },
    ]);
  }
  return station;
}

/**
 * Stores a verdict once per clientId: a replayed offline action finds the first row.
 * `station` is the station as it ran (before any progression step), so the next plan knows its area.
 */
export async function storeFeedback(
  manager: EntityManager,
  auth: AuthContext,
  row: SessionPlan,
  station: Station,
  input: FeedbackInput,
): Promise<{ feedback: Feedback; created: boolean }> {
  const repo = manager.getRepository(Feedback);
  if (input.clientId) {
    const existing = await repo.findOne({ where: { planId: row.id, clientId: input.clientId } });
    if (existing) return { feedback: existing, created: false };
  }
  const inserted = await manager
    .createQueryBuilder()
    .insert()
    .into(Feedback)
    .values({
      clubId: auth.clubId,
      teamId: row.teamId,
      planId: row.id,
      stationId: input.stationId,
      phaseIndex: input.phaseIndex,
      activityKind: station.activityKind,
      activityId: station.activityId.slice(0, 64),
      areaWidth: station.area.width,
      areaLength: station.area.length,
      groupSize: station.playerIds.length + station.coachJoins,
      verdict: input.verdict,
      note: input.note ?? null,
      clientId: input.clientId ?? null,
      authorId: auth.userId,
    })
    .orIgnore()
    .returning('*')
    .execute();
  const id = (inserted.raw as { id?: string }[])[0]?.id;
  if (id) return { feedback: await repo.findOneByOrFail({ id }), created: true };
  // Lost a race with the same clientId: the other insert won, return its row.
  return {
    feedback: await repo.findOneByOrFail({ planId: row.id, clientId: input.clientId! }),
    created: false,
  };
}

/** Feedback on a plan's stations: record (idempotent by clientId) and list. */
export class FeedbackService {
  constructor(private readonly scope: ClubScope) {}

  async record(planId: string, input: FeedbackInput): Promise<{ dto: FeedbackDto; created: boolean }> {
    return this.scope.transaction(async (scope) => {
      const row = await scope.plan(planId);
      // A verdict steers the team's next plan: only its own staff (or the lead) give one.
      await scope.teamToRun(row.teamId, 'judge its stations');
      const station = stationOf(row.plan, input.phaseIndex, input.stationId);
      const { feedback, created } = await storeFeedback(scope.manager, scope.auth, row, station, input);
      return { dto: feedbackDto(feedback), created };
    });
  }

  async list(planId: string): Promise<FeedbackDto[]> {
    const row = await this.scope.plan(planId);
    await this.scope.teamToRead(row.teamId);
    const rows = await this.scope.manager
      .getRepository(Feedback)
      .find({ where: { planId: row.id, clubId: this.scope.clubId }, order: { createdAt: 'ASC' } });
    return rows.map(feedbackDto);
  }
}
