import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { RuleSetDto, RuleSetSummaryDto } from '../../../../shared/types';

/**
 * Club rule sets as every member reads them: the rule set a stored plan was made with (so the
 * browser re-checks edits by the club's own rules) and its name and publishing date.
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
}
