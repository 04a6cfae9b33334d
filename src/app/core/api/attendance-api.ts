import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { AttendanceDto, AttendanceEntryDto } from '../../../../shared/types';

/** The register of one planned session (/api/plans/:id/attendance): who came, how late, how early they left. */
@Injectable({ providedIn: 'root' })
export class AttendanceApi {
  private readonly http = inject(HttpClient);

  /** GET /api/plans/:id/attendance. */
  get(planId: string): Observable<AttendanceDto> {
    return this.http.get<AttendanceDto>(`/api/plans/${encodeURIComponent(planId)}/attendance`);
  }

  /** PUT /api/plans/:id/attendance: replaces the register. */
  save(planId: string, players: AttendanceEntryDto[]): Observable<AttendanceDto> {
    return this.http.put<AttendanceDto>(`/api/plans/${encodeURIComponent(planId)}/attendance`, { players });
  }
}
