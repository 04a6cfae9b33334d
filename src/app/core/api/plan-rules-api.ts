import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { RuleSetDto } from '../../../../shared/types';

/** The rule set a stored plan was made with, so the browser re-checks edits by the club's own rules. */
@Injectable({ providedIn: 'root' })
export class PlanRulesApi {
  private readonly http = inject(HttpClient);

  /** GET /api/rule-sets/:id: every member may read it; "default" answers the engine's own rules. */
  get(ruleSetId: string): Observable<RuleSetDto> {
    return this.http.get<RuleSetDto>(`/api/rule-sets/${encodeURIComponent(ruleSetId)}`);
  }
}
