import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { ClubRetentionDto } from '../../../../shared/types/api';

/** How long the club keeps plans and attendance: GET and PUT /api/club/retention (the head of coaching changes it). */
@Injectable({ providedIn: 'root' })
export class ClubRetentionApi {
  private readonly http = inject(HttpClient);

  get(): Observable<ClubRetentionDto> {
    return this.http.get<ClubRetentionDto>('/api/club/retention');
  }

  set(seasons: number): Observable<ClubRetentionDto> {
    return this.http.put<ClubRetentionDto>('/api/club/retention', { seasons });
  }
}
