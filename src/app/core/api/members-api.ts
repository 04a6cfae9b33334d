import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { InvitationDto, MemberDto, Role } from '../../../../shared/types';

/** The club's members (everyone reads names and roles; the lead also e-mails) and invitations (lead). */
@Injectable({ providedIn: 'root' })
export class MembersApi {
  private readonly http = inject(HttpClient);

  /** GET /api/members: everyone in the caller's club with their role. */
  listMembers(): Observable<MemberDto[]> {
    return this.http.get<MemberDto[]>('/api/members');
  }

  /** GET /api/invitations: invitations sent by the club, accepted or not. */
  listInvitations(): Observable<InvitationDto[]> {
    return this.http.get<InvitationDto[]>('/api/invitations');
  }

  /** PATCH /api/members/:userId: gives a member another role. */
  changeRole(userId: string, role: Role): Observable<MemberDto> {
    return this.http.patch<MemberDto>(`/api/members/${encodeURIComponent(userId)}`, { role });
  }

  /** DELETE /api/members/:userId: takes someone out of the club. */
  removeMember(userId: string): Observable<void> {
    return this.http.delete<void>(`/api/members/${encodeURIComponent(userId)}`);
  }

  /** DELETE /api/invitations/:id: the link stops working. */
  revoke(invitationId: string): Observable<void> {
    return this.http.delete<void>(`/api/invitations/${encodeURIComponent(invitationId)}`);
  }

  /**
   * POST /api/invitations: e-mails a single-use link that joins the club with the role and, when a
   * team is given, puts the invitee on that team's staff.
   */
  invite(email: string, role: Role, teamId: string | null = null): Observable<InvitationDto> {
    return this.http.post<InvitationDto>(
      '/api/invitations',
      teamId ? { email, role, teamId } : { email, role },
    );
  }
}
