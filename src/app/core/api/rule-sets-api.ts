import { HttpClient, HttpHeaders } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { RuleSetDto, RuleSetSummaryDto } from '../../../../shared/types';
import type { RuleSetChangeDto, RuleSetReachDto } from '../../../../shared/types/rule-set-api';

/**
 * Club rule sets. Every member reads the one a stored plan was made with (so the browser
 * re-checks edits by the club's own rules) and its name and publishing date; the head of coaching
 * lists every version, drafts, saves, publishes and rolls back.
 */
@Injectable({ providedIn: 'root' })
export class RuleSetsApi {
  private readonly http = inject(HttpClient);

  /** GET /api/rule-sets/:id: "default" answers the engine's own rules. */
  get(ruleSetId: string): Observable<RuleSetDto> {
    return this.http.get<RuleSetDto>(`/api/rule-sets/${encodeURIComponent(ruleSetId)}`);
  }

  /** GET /api/rule-sets/:id/summary: the rules' name, version and when they were published. */
  summary(ruleSetId: string): Observable<RuleSetSummaryDto> {
    return this.http.get<RuleSetSummaryDto>(`/api/rule-sets/${encodeURIComponent(ruleSetId)}/summary`);
  }

  /** GET /api/rule-sets: all versions, for the editor and its history (head of coaching). */
  list(): Observable<RuleSetDto[]> {
    return this.http.get<RuleSetDto[]>('/api/rule-sets');
  }

  /** GET /api/rule-sets/history: each save, publish and roll back, newest first, with the places it touched. */
  history(): Observable<RuleSetChangeDto[]> {
    return this.http.get<RuleSetChangeDto[]>('/api/rule-sets/history');
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
}
