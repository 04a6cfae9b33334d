import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import {
  HELPER_TOKEN_HEADER,
  type CreatedHelperLinkDto,
  type HelperLinkDto,
  type HelperViewDto,
} from '../../../../shared/types';

/** Helper links: the team's staff make, list and stop them; a helper reads the plan through one. */
@Injectable({ providedIn: 'root' })
export class HelperLinksApi {
  private readonly http = inject(HttpClient);

  /** A new link; its address (with the token) is shown this once. */
  create(planId: string): Observable<CreatedHelperLinkDto> {
    return this.http.post<CreatedHelperLinkDto>(`/api/plans/${planId}/helper-links`, null);
  }

  /** The plan's links that still work, newest first. */
  list(planId: string): Observable<HelperLinkDto[]> {
    return this.http.get<HelperLinkDto[]>(`/api/plans/${planId}/helper-links`);
  }

  /** Stops a link at once. */
  revoke(planId: string, linkId: string): Observable<void> {
    return this.http.delete<void>(`/api/plans/${planId}/helper-links/${linkId}`);
  }

  /** The plan as a helper sees it, for the token from the link's fragment. */
  view(token: string): Observable<HelperViewDto> {
    return this.http.get<HelperViewDto>('/api/helper-view', { headers: { [HELPER_TOKEN_HEADER]: token } });
  }
}
