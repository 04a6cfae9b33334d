import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';

/** Deleting for good: one's own account, or the whole club (head of coaching). */
@Injectable({ providedIn: 'root' })
export class DeletionApi {
  private readonly http = inject(HttpClient);

  /** DELETE /api/auth/me: the caller's account, given their password. */
  deleteAccount(password: string): Observable<void> {
    return this.http.delete<void>('/api/auth/me', { body: { password } });
  }

  /** DELETE /api/club: the caller's whole club, given its name typed exactly. */
  deleteClub(clubName: string): Observable<void> {
    return this.http.delete<void>('/api/club', { body: { clubName } });
  }
}
