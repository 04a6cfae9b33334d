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

/** A plan's two large documents, each turned into JSON text once. */
export interface PlanTexts {
  request: string;
  plan: string;
}

/**
 * The JSON of sessionPlanDto built around texts already made for the database, so a new plan's
 * 22 kB document is serialized once per request instead of twice.
 */
export function sessionPlanJson(row: SessionPlan, teamName: string, texts: PlanTexts): string {
  const { request: _request, plan: _plan, ...small } = sessionPlanDto(row, teamName);
  const head = JSON.stringify(small);
  return `${head.slice(0, -1)},"request":${texts.request},"plan":${texts.plan}}`;
}
