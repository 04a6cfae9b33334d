/** API shapes for plan activity beyond the basic plan DTOs: pitch-side changes and team insight. */
import type { FeedbackDto, SessionPlanDto } from './api';
import type { PlayerMove, StationVerdict } from './plan-edit';
import type { PlanKind, PresentPlayer } from './plan-request';

/** Body of POST /api/plans/:id/replan (shared/schemas/api/plan-replan.schema.json). */
export interface ReplanBody {
  add?: PresentPlayer[];
  remove?: string[];
  fromMinute: number;
  clientId?: string;
}

/** Body of POST /api/plans/:id/progression and /feedback. */
export interface VerdictBody {
  phaseIndex: number;
  stationId: string;
  verdict: StationVerdict;
  clientId?: string;
  note?: string;
}

/** Answer of POST /api/plans/:id/replan and /progression. */
export interface PlanChangeDto {
  plan: SessionPlanDto;
  /** Who changed station (replan); empty for a progression. */
  moves: PlayerMove[];
  /** The stored feedback (progression only); the same row when a clientId is replayed. */
  feedback?: FeedbackDto;
}

/** Answer of POST /api/plans/:id/share. */
export interface ShareResultDto {
  /** Messages put in the outbox: one per recipient. */
  queued: number;
  messageIds: string[];
}

export interface InsightSessionDto {
  planId: string;
  date: string | null;
  createdAt: string;
  kind: PlanKind;
  /** Players who came: the recorded attendance, else the players the plan was made for. */
  present: number;
  /** Whether `present` comes from recorded attendance. */
  recorded: boolean;
  /** Of those present, how many came late and how many left early (both count as present). */
  cameLate: number;
  leftEarly: number;
  /** Estimated touches per player id in this session (attending players only). */
  touches: Record<string, number>;
}

export interface InsightPlayerDto {
  playerId: string;
  displayName: string;
  active: boolean;
  sessionsAttended: number;
  totalTouches: number;
  /** Mean estimated touches per session attended that has an estimate for the player (0 when none). */
  averageTouches: number;
}

/** Answer of GET /api/teams/:id/insight: attendance over time and estimated touches per player. */
export interface TeamInsightDto {
  teamId: string;
  squadSize: number;
  /** Oldest first. */
  sessions: InsightSessionDto[];
  players: InsightPlayerDto[];
  /** Touches are estimates from per-activity rates, not counts. */
  estimateNote: string;
}
