import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { AuthResponse, Role, UserDto } from '../../../../shared/types';
import type { DistanceUnit, TemperatureUnit } from '../../../../shared/units';

export interface SignInBody {
  email: string;
  password: string;
}

export interface CreateClubBody {
  clubName: string;
  name: string;
  email: string;
  password: string;
  /** The club's IANA time zone: its schedule and calendar feed are local to it. */
  timeZone?: string;
}

export interface ChangePasswordBody {
  currentPassword: string;
  newPassword: string;
}

export interface AcceptInvitationBody {
  name: string;
  password: string;
}

/** What an invitation link is for, shown before the invitee joins. */
export interface InvitationLookup {
  email: string;
  role: Role;
  clubName: string;
  expiresAt: string;
  /** The team the invitee will help with, when the invitation names one. */
  teamName: string | null;
}

/** Sign-in, club creation and invitations (the calls that hand out a session), and ending sessions. */
@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);

  /** POST /api/auth/login. */
  signIn(body: SignInBody): Observable<AuthResponse> {
    return this.http.post<AuthResponse>('/api/auth/login', body);
  }

  /** POST /api/auth/register: a new club and its lead. */
  createClub(body: CreateClubBody): Observable<AuthResponse> {
    // The club's sessions are local to where it is made: the browser's own zone.
    const timeZone = Intl.DateTimeFormat().resolvedOptions().timeZone;
    return this.http.post<AuthResponse>('/api/auth/register', timeZone ? { timeZone, ...body } : body);
  }

  /** POST /api/invitations/accept: the invitee sets their name and password. */
  acceptInvitation(token: string, body: AcceptInvitationBody): Observable<AuthResponse> {
    return this.http.post<AuthResponse>('/api/invitations/accept', { token, ...body });
  }

  /** POST /api/invitations/lookup: the club, role and e-mail an unused invitation is for. */
  lookupInvitation(token: string): Observable<InvitationLookup> {
    return this.http.post<InvitationLookup>('/api/invitations/lookup', { token });
  }

  /** POST /api/auth/sign-out: this session ends on the server too, not only in this browser. */
  signOut(): Observable<void> {
    return this.http.post<void>('/api/auth/sign-out', {});
  }

  /** POST /api/auth/sign-out-everywhere: every session of the caller ends, on every device. */
  signOutEverywhere(): Observable<void> {
    return this.http.post<void>('/api/auth/sign-out-everywhere', {});
  }

  /** POST /api/auth/password: a new password; every session of the caller ends with it. */
  changePassword(body: ChangePasswordBody): Observable<void> {
    return this.http.post<void>('/api/auth/password', body);
  }

  /** POST /api/auth/password-reset: the same answer whether or not an account uses the address. */
  requestPasswordReset(email: string): Observable<{ message: string }> {
    return this.http.post<{ message: string }>('/api/auth/password-reset', { email });
  }

  /** POST /api/auth/password-reset/confirm: a new password with the e-mailed link's token. */
  confirmPasswordReset(token: string, password: string): Observable<void> {
    return this.http.post<void>('/api/auth/password-reset/confirm', { token, password });
  }

  /** POST /api/auth/email-confirmation: the link mailed to a new account's address, opened. */
  confirmEmail(token: string): Observable<void> {
    return this.http.post<void>('/api/auth/email-confirmation', { token });
  }

  /** POST /api/auth/email-confirmation/resend: another link for the signed-in person's address. */
  resendEmailConfirmation(): Observable<{ outcome: 'sent' | 'confirmed' | 'wait'; message: string }> {
    return this.http.post<{ outcome: 'sent' | 'confirmed' | 'wait'; message: string }>(
      '/api/auth/email-confirmation/resend',
      {},
    );
  }

  /** GET /api/auth/me. */
  me(): Observable<UserDto> {
    return this.http.get<UserDto>('/api/auth/me');
  }

  /** PATCH /api/auth/me: the caller's own units (null follows the club); answers the updated user. */
  changeOwnUnits(body: {
    distanceUnit?: DistanceUnit | null;
    temperatureUnit?: TemperatureUnit | null;
  }): Observable<UserDto> {
    return this.http.patch<UserDto>('/api/auth/me', body);
  }

  /** PATCH /api/auth/me: the browser's locale (a BCP 47 tag) for the caller's cards and e-mails. */
  changeLocale(locale: string): Observable<UserDto> {
    return this.http.patch<UserDto>('/api/auth/me', { locale });
  }

  /** PATCH /api/auth/me: the caller's own display name; answers the updated user. */
  changeName(name: string): Observable<UserDto> {
    return this.http.patch<UserDto>('/api/auth/me', { name });
  }
}
