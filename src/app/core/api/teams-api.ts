import { HttpClient, HttpContext } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type {
  AgeGroup,
  KitBagDto,
  Level,
  PinnedActivitiesDto,
  Space,
  TeamDto,
  TeamInsightDto,
} from '../../../../shared/types';

export interface TeamBody {
  name: string;
  ageGroup: AgeGroup;
  level: Level;
  usualSpace?: Space;
}

/** Teams of the caller's club: each team, its staff, kit bag, pinned activities and insight. */
@Injectable({ providedIn: 'root' })
export class TeamsApi {
  private readonly http = inject(HttpClient);

  list(): Observable<TeamDto[]> {
    return this.http.get<TeamDto[]>('/api/teams');
  }

  get(id: string): Observable<TeamDto> {
    return this.http.get<TeamDto>(`/api/teams/${id}`);
  }

  /** A new team; `context` may carry the form's Idempotency-Key (see RetryKey). */
  create(body: TeamBody, context?: HttpContext): Observable<TeamDto> {
    return this.http.post<TeamDto>('/api/teams', body, { context });
  }

  update(id: string, body: Partial<TeamBody>): Observable<TeamDto> {
    return this.http.patch<TeamDto>(`/api/teams/${id}`, body);
  }

  remove(id: string): Observable<void> {
    return this.http.delete<void>(`/api/teams/${id}`);
  }

  /** PUT /api/teams/:id/staff/:userId: puts a club member on the team; answers the team. */
  addStaff(id: string, userId: string): Observable<TeamDto> {
    return this.http.put<TeamDto>(`/api/teams/${id}/staff/${encodeURIComponent(userId)}`, null);
  }

  /** DELETE /api/teams/:id/staff/:userId: takes a member off the team; answers the team. */
  removeStaff(id: string, userId: string): Observable<TeamDto> {
    return this.http.delete<TeamDto>(`/api/teams/${id}/staff/${encodeURIComponent(userId)}`);
  }

  kit(id: string): Observable<KitBagDto> {
    return this.http.get<KitBagDto>(`/api/teams/${id}/kit`);
  }

  saveKit(id: string, kit: KitBagDto): Observable<KitBagDto> {
    return this.http.put<KitBagDto>(`/api/teams/${id}/kit`, kit);
  }

  /**
   * PUT /api/teams/:id/pinned-activities: the whole list of activities the team's next plan should
   * use where they fit (pinning adds to it, unpinning leaves one out); answers the list as kept.
   */
  savePinnedActivities(id: string, activityIds: string[]): Observable<string[]> {
    const body: PinnedActivitiesDto = { activityIds };
    return this.http
      .put<PinnedActivitiesDto>(`/api/teams/${id}/pinned-activities`, body)
      .pipe(map((saved) => saved.activityIds));
  }

  /** GET /api/teams/:id/insight: the team's attendance and estimated touches across its sessions. */
  insight(id: string): Observable<TeamInsightDto> {
    return this.http.get<TeamInsightDto>(`/api/teams/${encodeURIComponent(id)}/insight`);
  }
}
