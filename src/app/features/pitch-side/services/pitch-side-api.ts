import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type {
  FeedbackDto,
  Plan,
  PlayerDto,
  PlayerMove,
  PresentPlayer,
  SessionPlanDto,
  StationVerdict,
} from '../../../../../shared/types';

/** Body of POST /api/plans/:id/replan. */
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

/** A plan as the server answers after a change, with who moved. */
export interface PlanChange {
  plan: Plan;
  version?: number;
  moves: PlayerMove[];
}

/** Reads a plan-changing answer whether the server nests the stored plan or sends the Plan itself. */
export function readPlanChange(body: unknown): PlanChange {
  const outer = (body ?? {}) as { plan?: unknown; moves?: PlayerMove[]; version?: number };
  let inner = outer.plan as { phases?: unknown; plan?: unknown; version?: number } | undefined;
  let version = outer.version;
  if (inner && !inner.phases && inner.plan) {
    version = inner.version ?? version;
    inner = inner.plan as typeof inner;
  }
  return { plan: inner as unknown as Plan, version, moves: outer.moves ?? [] };
}

/** The pitch-side calls: the plan, the team roster, re-plans, progressions and feedback. */
@Injectable({ providedIn: 'root' })
export class PitchSideApi {
  private readonly http = inject(HttpClient);

  /** GET /api/plans/:id. */
  getPlan(planId: string): Observable<SessionPlanDto> {
    return this.http.get<SessionPlanDto>(`/api/plans/${encodeURIComponent(planId)}`);
  }

  /** GET /api/teams/:id/players: the roster, to offer late arrivals. */
  listPlayers(teamId: string): Observable<PlayerDto[]> {
    return this.http
      .get<PlayerDto[] | { items: PlayerDto[] }>(`/api/teams/${encodeURIComponent(teamId)}/players`)
      .pipe(map((body) => (Array.isArray(body) ? body : (body.items ?? []))));
  }

  /** POST /api/plans/:id/replan: re-plans the remaining phases with as few moves as possible. */
  replan(planId: string, body: ReplanBody): Observable<PlanChange> {
    return this.http
      .post<unknown>(`/api/plans/${encodeURIComponent(planId)}/replan`, body)
      .pipe(map(readPlanChange));
  }

  /** POST /api/plans/:id/progression: steps the station easier or harder. */
  progression(planId: string, body: VerdictBody): Observable<PlanChange> {
    return this.http
      .post<unknown>(`/api/plans/${encodeURIComponent(planId)}/progression`, body)
      .pipe(map(readPlanChange));
  }

  /** POST /api/plans/:id/feedback: records how the station went (stored once per clientId). */
  feedback(planId: string, body: VerdictBody): Observable<FeedbackDto> {
    return this.http.post<FeedbackDto>(`/api/plans/${encodeURIComponent(planId)}/feedback`, body);
  }
}
