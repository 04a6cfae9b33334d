import { HttpClient, HttpContext, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type {
  FeedbackDto,
  Page,
  Plan,
  PlanChangeDto,
  PlanRequest,
  PlanSummaryDto,
  SessionPlanDto,
  ReplanBody,
  ShareResultDto,
  VerdictBody,
} from '../../../../shared/types';
import type { PlanEdit } from '../../../../shared/types/plan-edit';

export interface CreatePlanBody {
  teamId: string;
  /** YYYY-MM-DD. */
  date?: string;
  /** HH:MM. */
  kickOff?: string;
  /** The scheduled session the plan is for. */
  scheduledSessionId?: string;
  request: PlanRequest;
}

export interface PlanQuery {
  teamId?: string;
  from?: string;
  to?: string;
  page?: number;
}

/** Paper sizes the printed card comes in (the plan-pdf-query and plan-share schemas). */
export type CardPaper = 'a4' | 'letter';

/** Body of PATCH /api/plans/:id: the edits made, or the plan as the browser's engine re-checked it. */
export interface UpdatePlanBody {
  edit?: PlanEdit;
  plan?: Plan;
  status?: 'draft' | 'final';
}

/** Session plans: generate, list, read, edit, print and share. */
@Injectable({ providedIn: 'root' })
export class PlansApi {
  private readonly http = inject(HttpClient);

  /** A new plan; `context` may carry the form's Idempotency-Key (see RetryKey). */
  create(body: CreatePlanBody, context?: HttpContext): Observable<SessionPlanDto> {
    return this.http.post<SessionPlanDto>('/api/plans', body, { context });
  }

  list(query: PlanQuery = {}): Observable<Page<PlanSummaryDto>> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) {
      if (value !== undefined && value !== '') params = params.set(key, String(value));
    }
    return this.http.get<Page<PlanSummaryDto>>('/api/plans', { params });
  }

  /** GET /api/plans/:id: the one read of a stored plan (the plan page through PlanPrefetch, the wizard). */
  get(id: string): Observable<SessionPlanDto> {
    return this.http.get<SessionPlanDto>(`/api/plans/${id}`);
  }

  /** Saves edits; `version` guards against overwriting someone else's newer save. */
  update(id: string, body: UpdatePlanBody, version?: number): Observable<SessionPlanDto> {
    const headers: Record<string, string> = version === undefined ? {} : { 'If-Match': String(version) };
    return this.http.patch<SessionPlanDto>(`/api/plans/${id}`, body, { headers });
  }

  /** Deletes a plan with its attendance and station feedback (the lead or a coach of its team). */
  remove(id: string): Observable<void> {
    return this.http.delete<void>(`/api/plans/${id}`);
  }

  /** The printable card as a PDF file. */
  pdf(id: string, paper: CardPaper = 'a4'): Observable<Blob> {
    return this.http.get(`/api/plans/${id}/pdf`, { params: { paper }, responseType: 'blob' });
  }

  /** E-mails the card, printed on `paper`, to each recipient. */
  share(id: string, recipients: string[], message?: string, paper?: CardPaper): Observable<ShareResultDto> {
    return this.http.post<ShareResultDto>(`/api/plans/${id}/share`, {
      recipients,
      ...(message ? { message } : {}),
      ...(paper ? { paper } : {}),
    });
  }

  /** Re-plans the phases still to come after arrivals and departures, moving as few as it can. */
  replan(id: string, body: ReplanBody): Observable<PlanChangeDto> {
    return this.http.post<PlanChangeDto>(`/api/plans/${id}/replan`, body);
  }

  /** Steps a station easier or harder (pitch-side's "too easy / too hard"). */
  progression(id: string, body: VerdictBody): Observable<PlanChangeDto> {
    return this.http.post<PlanChangeDto>(`/api/plans/${id}/progression`, body);
  }

  /** Records how a station went; stored once per `clientId`. */
  feedback(id: string, body: VerdictBody): Observable<FeedbackDto> {
    return this.http.post<FeedbackDto>(`/api/plans/${id}/feedback`, body);
  }
}
