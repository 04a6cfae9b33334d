import type { FeedbackDto, PlanSummaryDto, SessionPlanDto } from '../../shared/types/api';
import type { Feedback } from '../entities/feedback';
import type { SessionPlan } from '../entities/session-plan';

/** The list form of a stored plan. */
export function planSummaryDto(row: SessionPlan, teamName: string): PlanSummaryDto {
  return {
    id: row.id,
    teamId: row.teamId,
    teamName,
    date: row.date,
    kickOff: row.kickOff,
    kind: row.kind,
    minutes: row.minutes,
    playerCount: row.playerCount,
    status: row.status,
    createdAt: row.createdAt.toISOString(),
  };
}

/** The full form of a stored plan, with its version for If-Match. */
export function sessionPlanDto(row: SessionPlan, teamName: string): SessionPlanDto {
  return {
    ...planSummaryDto(row, teamName),
    request: row.request,
    plan: row.plan,
    ruleSetId: row.ruleSetId,
    ruleSetVersion: row.ruleSetVersion,
    seed: row.seed,
    authorId: row.authorId ?? '',
    version: row.version,
  };
}

export function feedbackDto(row: Feedback): FeedbackDto {
  return {
    id: row.id,
    planId: row.planId,
    stationId: row.stationId,
    phaseIndex: row.phaseIndex,
    verdict: row.verdict,
    ...(row.note ? { note: row.note } : {}),
    ...(row.clientId ? { clientId: row.clientId } : {}),
    createdAt: row.createdAt.toISOString(),
  };
}
