import { HttpClient, HttpContext } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { CsvPreview, CsvPreviewRow, PlayerDto } from '../../../../shared/types';

export interface PlayerBody {
  displayName: string;
  goalkeeper?: boolean;
  active?: boolean;
}

/** A team's players, one by one or from a CSV file. */
@Injectable({ providedIn: 'root' })
export class PlayersApi {
  private readonly http = inject(HttpClient);

  /** The team's players; inactive ones too when asked (the squad table shows them). */
  list(teamId: string, includeInactive = false): Observable<PlayerDto[]> {
    const params = includeInactive ? { includeInactive: 'true' } : undefined;
    return this.http.get<PlayerDto[]>(`/api/teams/${teamId}/players`, { params });
  }

  /** A new player; `context` may carry the form's Idempotency-Key (see RetryKey). */
  create(teamId: string, body: PlayerBody, context?: HttpContext): Observable<PlayerDto> {
    return this.http.post<PlayerDto>(`/api/teams/${teamId}/players`, body, { context });
  }

  /**
   * Today's guests for a plan, added to the team's list as not active: all of them, or none when
   * one name is taken (409).
   */
  addGuests(
    teamId: string,
    guests: Pick<PlayerBody, 'displayName' | 'goalkeeper'>[],
  ): Observable<PlayerDto[]> {
    return this.http.post<PlayerDto[]>(`/api/teams/${teamId}/guests`, { guests });
  }

  update(id: string, body: Partial<PlayerBody>): Observable<PlayerDto> {
    return this.http.patch<PlayerDto>(`/api/players/${id}`, body);
  }

  remove(id: string): Observable<void> {
    return this.http.delete<void>(`/api/players/${id}`);
  }

  /** Uploads a CSV file; the server answers with the rows it read and each row's errors. */
  previewImport(teamId: string, file: File): Observable<CsvPreview> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post<CsvPreview>(`/api/teams/${teamId}/players/import`, form);
  }

  /**
   * Adds the previewed lines with the names the coach kept or typed (`skip` leaves a line out);
   * the server checks the lines are the ones it previewed and that no name is taken.
   */
  commitImport(
    teamId: string,
    body: {
      importId: string;
      rows: (Pick<CsvPreviewRow, 'row' | 'displayName' | 'goalkeeper'> & { skip?: boolean })[];
    },
  ): Observable<PlayerDto[]> {
    return this.http.post<PlayerDto[]>(`/api/teams/${teamId}/players/import/commit`, body);
  }
}
