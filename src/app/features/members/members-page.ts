import { ChangeDetectionStrategy, Component, computed, inject, signal, viewChild } from '@angular/core';
import { FormBuilder, FormGroupDirective, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { DatePipe } from '@angular/common';
import { forkJoin } from 'rxjs';
import { ROLES, type InvitationDto, type MemberDto, type Role } from '../../../../shared/types';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { AuthStore } from '../../core/auth/auth-store';
import { MembersApi } from './services/members-api';

/** What each role may do, in the words the invite form shows. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  lead: 'Head of coaching: club rules, members and every team',
  coach: 'Runs their teams: players, kit bag and plans',
  assistant: 'Helps at sessions: sees plans, records attendance and how stations went',
};

/** The club's people: who is in, with which role, and who has been invited. */
@Component({
  selector: 'cw-members-page',
  imports: [
    ReactiveFormsModule,
    DatePipe,
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
  ],
  templateUrl: './members-page.html',
  styleUrl: './members-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage {
  private readonly api = inject(MembersApi);

  protected readonly roles = ROLES;
  protected readonly roleDescriptions = ROLE_DESCRIPTIONS;
  protected readonly members = signal<MemberDto[]>([]);
  protected readonly invitations = signal<InvitationDto[]>([]);
  protected readonly loaded = signal(false);
  protected readonly loadError = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly inviteError = signal<string | null>(null);
  protected readonly inviteNotice = signal<string | null>(null);
  protected readonly rowError = signal<string | null>(null);
  /** The signed-in lead, who cannot demote or remove themselves here. */
  protected readonly me = inject(AuthStore).user;

  /** Invitations not yet accepted, soonest to expire first. */
  protected readonly pending = computed(() =>
    this.invitations()
      .filter((invitation) => !invitation.acceptedAt)
      .sort((a, b) => a.expiresAt.localeCompare(b.expiresAt)),
  );
  protected readonly sortedMembers = computed(() =>
    [...this.members()].sort(
      (a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.name.localeCompare(b.name),
    ),
  );

  protected readonly form = inject(FormBuilder).nonNullable.group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    role: ['coach' as Role, Validators.required],
  });

  /** The form's directive: resetting through it also clears "submitted", so no error shows after a send. */
  private readonly formDirective = viewChild.required(FormGroupDirective);

  constructor() {
    this.reload();
  }

  protected reload(): void {
    this.loadError.set(null);
    forkJoin({ members: this.api.listMembers(), invitations: this.api.listInvitations() }).subscribe({
      next: ({ members, invitations }) => {
        this.members.set(members);
        this.invitations.set(invitations);
        this.loaded.set(true);
      },
      error: (error: unknown) => this.loadError.set(problemMessage(error)),
    });
  }

  protected isExpired(invitation: InvitationDto): boolean {
    return new Date(invitation.expiresAt).getTime() < Date.now();
  }

  protected changeRole(member: MemberDto, role: Role): void {
    if (role === member.role) return;
    this.rowError.set(null);
    this.api.changeRole(member.userId, role).subscribe({
      next: (updated) => {
        this.members.update((list) => list.map((m) => (m.userId === updated.userId ? updated : m)));
        this.inviteNotice.set(`${updated.name} is now ${updated.role}.`);
      },
      error: (error: unknown) => {
        // Put the select back to what the server still holds.
        this.members.update((list) => [...list]);
        this.rowError.set(problemMessage(error));
      },
    });
  }

  protected removeMember(member: MemberDto): void {
    if (!confirm(`Remove ${member.name} from the club? They lose access at once.`)) return;
    this.rowError.set(null);
    this.api.removeMember(member.userId).subscribe({
      next: () => {
        this.members.update((list) => list.filter((m) => m.userId !== member.userId));
        this.inviteNotice.set(`${member.name} was removed from the club.`);
      },
      error: (error: unknown) => this.rowError.set(problemMessage(error)),
    });
  }

  protected revoke(invitation: InvitationDto): void {
    this.api.revoke(invitation.id).subscribe({
      next: () => {
        this.invitations.update((list) => list.filter((i) => i.id !== invitation.id));
        this.inviteNotice.set(`The invitation to ${invitation.email} no longer works.`);
      },
      error: (error: unknown) => this.rowError.set(problemMessage(error)),
    });
  }

  protected sendInvitation(): void {
    if (this.sending()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { email, role } = this.form.getRawValue();
    const address = email.trim().toLowerCase();
    this.sending.set(true);
    this.inviteError.set(null);
    this.inviteNotice.set(null);
    this.api.invite(address, role).subscribe({
      next: (invitation) => {
        this.sending.set(false);
        this.invitations.update((list) => [invitation, ...list.filter((i) => i.id !== invitation.id)]);
        this.inviteNotice.set(`Invitation sent to ${invitation.email} as ${invitation.role}.`);
        this.formDirective().resetForm({ email: '', role });
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const fieldErrors = problemFieldErrors(error);
        if (fieldErrors['email']) this.form.controls.email.setErrors({ server: fieldErrors['email'] });
        this.inviteError.set(problemMessage(error));
      },
    });
  }
}
