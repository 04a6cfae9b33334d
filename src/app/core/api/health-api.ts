import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { HealthDto } from '../../../../shared/types';

/** Reads the server's health: is the API up, and is its database? */
@Injectable({ providedIn: 'root' })
export class HealthApi {
  private readonly http = inject(HttpClient);

  /** GET /api/health. A 503 still carries a body saying what is down. */
  read(): Observable<HealthDto> {
    return this.http.get<HealthDto>('/api/health');
  }
}
