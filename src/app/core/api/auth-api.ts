import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { AuthResponse, UserDto } from '../../../../shared/types';

export interface SignInBody {
  email: string;
  password: string;
}

export interface CreateClubBody {
  clubName: string;
  name: string;
  email: string;
  password: string;
}

export interface AcceptInvitationBody {
  name: string;
  password: string;
}

/** Sign-in, club creation and invitations: the calls that hand out a session. */
@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);

  /** POST /api/auth/login. */
  signIn(body: SignInBody): Observable<AuthResponse> {
    return this.http.post<AuthResponse>('/api/auth/login', body);
  }

  /** POST /api/auth/register: a new club and its lead. */
  createClub(body: CreateClubBody): Observable<AuthResponse> {
    return this.http.post<AuthResponse>('/api/auth/register', body);
  }

  /** POST /api/invitations/accept: the invitee sets their name and password. */
  acceptInvitation(token: string, body: AcceptInvitationBody): Observable<AuthResponse> {
    return this.http.post<AuthResponse>('/api/invitations/accept', { token, ...body });
  }

  /** GET /api/auth/me. */
  me(): Observable<UserDto> {
    return this.http.get<UserDto>('/api/auth/me');
  }
}
