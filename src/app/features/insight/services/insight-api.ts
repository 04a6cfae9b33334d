import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { TeamDto } from '../../../../../shared/types';
import type { TeamInsightDto } from '../../../../../shared/types/plan-api';

/** A team's attendance and estimated touches across its sessions. */
@Injectable({ providedIn: 'root' })
export class InsightApi {
  private readonly http = inject(HttpClient);

  /** GET /api/teams/:id/insight. */
  insight(teamId: string): Observable<TeamInsightDto> {
    return this.http.get<TeamInsightDto>(`/api/teams/${encodeURIComponent(teamId)}/insight`);
  }

  /** GET /api/teams/:id, for the team's name. */
  team(teamId: string): Observable<TeamDto> {
    return this.http.get<TeamDto>(`/api/teams/${encodeURIComponent(teamId)}`);
  }
}
