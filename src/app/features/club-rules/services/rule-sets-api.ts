import { HttpClient, HttpHeaders } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type { Page, PlanSummaryDto, RuleSetDto, SessionPlanDto } from '../../../../../shared/types';
import type { RuleSetChangeDto, RuleSetReachDto } from '../../../../../shared/types/rule-set-api';

/** The club's rule sets: every version, drafts and published, with who changed them. Lead only. */
@Injectable({ providedIn: 'root' })
export class RuleSetsApi {
  private readonly http = inject(HttpClient);

  /** GET /api/rule-sets: all versions, for the editor and its history. */
  list(): Observable<RuleSetDto[]> {
    return this.http
      .get<RuleSetDto[] | { items: RuleSetDto[] }>('/api/rule-sets')
      .pipe(map((body) => (Array.isArray(body) ? body : (body.items ?? []))));
  }

  /** GET /api/rule-sets/history: each save, publish and roll back, newest first, with the places it touched. */
  history(): Observable<RuleSetChangeDto[]> {
    return this.http.get<RuleSetChangeDto[]>('/api/rule-sets/history');
  }

  /** GET /api/rule-sets/:id (an id, or "published"). */
  get(id: string): Observable<RuleSetDto> {
    return this.http.get<RuleSetDto>(`/api/rule-sets/${encodeURIComponent(id)}`);
  }

  /** POST /api/rule-sets: a new draft copied from a version, the published set or the default. */
  createDraft(name: string, from: string): Observable<RuleSetDto> {
    return this.http.post<RuleSetDto>('/api/rule-sets', { name, from });
  }

  /** PUT /api/rule-sets/:id with If-Match: a stale revision answers 409 and nothing is overwritten. */
  save(draft: RuleSetDto, body: unknown, name = draft.name): Observable<RuleSetDto> {
    const headers = new HttpHeaders({ 'If-Match': `"${draft.revision}"` });
    return this.http.put<RuleSetDto>(
      `/api/rule-sets/${encodeURIComponent(draft.id)}`,
      { name, body },
      { headers },
    );
  }

  /** POST /api/rule-sets/:id/publish: the club's rules for new plans from now on. */
  publish(id: string): Observable<RuleSetDto> {
    return this.http.post<RuleSetDto>(`/api/rule-sets/${encodeURIComponent(id)}/publish`, {});
  }

  /** GET /api/rule-sets/reach: the teams (and their staff) whose new plans follow the published rules. */
  reach(): Observable<RuleSetReachDto> {
    return this.http.get<RuleSetReachDto>('/api/rule-sets/reach');
  }

  /** POST /api/rule-sets/rollback: publishes an earlier version again, as a new version. */
  rollback(to: string): Observable<RuleSetDto> {
    return this.http.post<RuleSetDto>('/api/rule-sets/rollback', { to });
  }

  /** GET /api/plans: the club's latest plans, to try a draft against. */
  recentPlans(count: number): Observable<PlanSummaryDto[]> {
    return this.http
      .get<Page<PlanSummaryDto> | PlanSummaryDto[]>('/api/plans', { params: { page: 1 } })
      .pipe(map((body) => (Array.isArray(body) ? body : body.items).slice(0, count)));
  }

  /** GET /api/plans/:id, for the request a recent plan was made from. */
  plan(id: string): Observable<SessionPlanDto> {
    return this.http.get<SessionPlanDto>(`/api/plans/${encodeURIComponent(id)}`);
  }
}
