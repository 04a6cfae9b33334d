import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { Units } from '../../../../shared/units';

/** The club's units: GET and PUT /api/club/units (only the head of coaching may change them). */
@Injectable({ providedIn: 'root' })
export class ClubUnitsApi {
  private readonly http = inject(HttpClient);

  get(): Observable<Units> {
    return this.http.get<Units>('/api/club/units');
  }

  /** Sets either or both; answers the whole setting. */
  set(body: Partial<Units>): Observable<Units> {
    return this.http.put<Units>('/api/club/units', body);
  }
}
