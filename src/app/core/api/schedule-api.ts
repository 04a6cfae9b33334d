import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Observable } from 'rxjs';
import type {
  ScheduledSessionBody,
  ScheduledSessionDto,
  TeamCalendarDto,
  WeeklySessionsBody,
} from '../../../../shared/types';

/** A team's training nights and matches, the caller's week, and each team's calendar feed. */
@Injectable({ providedIn: 'root' })
export class ScheduleApi {
  private readonly http = inject(HttpClient);

  /** A team's sessions from today (the club's) for `days` days. */
  list(teamId: string, days = 120): Observable<ScheduledSessionDto[]> {
    return this.http.get<ScheduledSessionDto[]>(`/api/teams/${teamId}/schedule`, {
      params: new HttpParams().set('days', days),
    });
  }

  /** The caller's teams' sessions from today for `days` days, in time order. */
  upcoming(days = 7): Observable<ScheduledSessionDto[]> {
    return this.http.get<ScheduledSessionDto[]>('/api/scheduled-sessions', {
      params: new HttpParams().set('days', days),
    });
  }

  get(id: string): Observable<ScheduledSessionDto> {
    return this.http.get<ScheduledSessionDto>(`/api/scheduled-sessions/${id}`);
  }

  create(teamId: string, body: ScheduledSessionBody): Observable<ScheduledSessionDto> {
    return this.http.post<ScheduledSessionDto>(`/api/teams/${teamId}/schedule`, body);
  }

  /** The same night every week until `body.until`. */
  createWeekly(teamId: string, body: WeeklySessionsBody): Observable<ScheduledSessionDto[]> {
    return this.http.post<ScheduledSessionDto[]>(`/api/teams/${teamId}/schedule/weekly`, body);
  }

  update(teamId: string, id: string, body: Partial<ScheduledSessionBody>): Observable<ScheduledSessionDto> {
    return this.http.patch<ScheduledSessionDto>(`/api/teams/${teamId}/schedule/${id}`, body);
  }

  remove(teamId: string, id: string): Observable<void> {
    return this.http.delete<void>(`/api/teams/${teamId}/schedule/${id}`);
  }

  calendar(teamId: string): Observable<TeamCalendarDto> {
    return this.http.get<TeamCalendarDto>(`/api/teams/${teamId}/calendar`);
  }

  /** A new calendar address; the old one stops working. */
  renewCalendar(teamId: string): Observable<TeamCalendarDto> {
    return this.http.post<TeamCalendarDto>(`/api/teams/${teamId}/calendar`, {});
  }

  stopCalendar(teamId: string): Observable<void> {
    return this.http.delete<void>(`/api/teams/${teamId}/calendar`);
  }
}
