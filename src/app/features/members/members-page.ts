import { ChangeDetectionStrategy, Component, computed, inject, signal, viewChild } from '@angular/core';
import { FormBuilder, FormGroupDirective, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router } from '@angular/router';
import { forkJoin } from 'rxjs';
import {
  ROLE_IN_A_SENTENCE,
  ROLE_LABELS,
  ROLES,
  type InvitationDto,
  type MemberDto,
  type Role,
  type TeamDto,
} from '../../../../shared/types';
import { MembersApi } from '../../core/api/members-api';
import { TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { momentDayWords, momentWords } from '../../core/locale/locale-format';
import { DataDownload } from '../../shared/components/data-download';
import { RoleChip } from '../../shared/components/role-chip';
import { MemberRoleDialog, type MemberRoleData } from './components/member-role-dialog';
import { MemberTeamsDialog, type MemberTeamsData } from './components/member-teams-dialog';
import { RemoveMemberDialog, type RemoveMemberData } from './components/remove-member-dialog';
import { ClubRetention } from './components/club-retention';
import { ClubUnits } from './components/club-units';
import { DeleteClub } from './components/delete-club';
import { ROLE_DESCRIPTIONS } from './role-descriptions';

export { ROLE_DESCRIPTIONS };

/** One member with the names of the teams they are on. */
interface MemberRow {
  member: MemberDto;
  teams: string[];
  self: boolean;
}

const DIALOG_SIZE = { width: '480px', maxWidth: 'calc(100vw - 32px)' };

/** The club's people: who is in, with which role and teams, and who has been invited. */
@Component({
  selector: 'cw-members-page',
  imports: [
    ReactiveFormsModule,
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    ...ICONS,
    MatInputModule,
    MatSelectModule,
    RoleChip,
    ClubUnits,
    ClubRetention,
    DeleteClub,
    DataDownload,
  ],
  templateUrl: './members-page.html',
  styleUrl: './members-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage {
  private readonly api = inject(MembersApi);
  private readonly teamsApi = inject(TeamsApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  protected readonly roles = ROLES;
  protected readonly roleDescriptions = ROLE_DESCRIPTIONS;
  protected readonly roleLabels = ROLE_LABELS;
  /** An expiry's day in the browser's locale and time zone: "Tue 1 Dec" (en-GB). */
  protected readonly dayOf = momentDayWords;
  /** An expiry's day and clock time in the browser's locale: "Tue 1 Dec, 16:20" (en-GB). */
  protected readonly momentOf = momentWords;
  protected readonly members = signal<MemberDto[]>([]);
  protected readonly invitations = signal<InvitationDto[]>([]);
  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly loaded = signal(false);
  protected readonly loadError = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly inviteError = signal<string | null>(null);
  protected readonly inviteNotice = signal<string | null>(null);
  protected readonly rowError = signal<string | null>(null);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  /** The signed-in lead, who cannot remove themselves here. */
  protected readonly me = this.auth.user;

  /** Invitations not yet accepted, soonest to expire first. */
  protected readonly pending = computed(() =>
    this.invitations()
      .filter((invitation) => !invitation.acceptedAt)
      .sort((a, b) => a.expiresAt.localeCompare(b.expiresAt)),
  );
  protected readonly rows = computed<MemberRow[]>(() =>
    [...this.members()]
      .sort((a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.name.localeCompare(b.name))
      .map((member) => ({
        member,
        teams: this.teams()
          .filter((team) => team.coachIds.includes(member.userId))
          .map((team) => team.name),
        self: member.userId === this.me()?.id,
      })),
  );

  protected readonly form = inject(FormBuilder).nonNullable.group({
    email: ['', [Validators.required, Validators.email, Validators.maxLength(254)]],
    role: ['coach' as Role, Validators.required],
    teamId: [''],
  });

  /** The form's directive: resetting through it also clears "submitted", so no error shows after a send. */
  private readonly formDirective = viewChild.required(FormGroupDirective);

  constructor() {
    this.reload();
  }

  protected reload(): void {
    this.loadError.set(null);
    forkJoin({
      members: this.api.listMembers(),
      invitations: this.api.listInvitations(),
      teams: this.teamsApi.list(),
    }).subscribe({
      next: ({ members, invitations, teams }) => {
        this.members.set(members);
        this.invitations.set(invitations);
        this.teams.set(teams);
        this.loaded.set(true);
      },
      error: (error: unknown) => this.loadError.set(problemMessage(error)),
    });
  }

  protected isExpired(invitation: InvitationDto): boolean {
    return new Date(invitation.expiresAt).getTime() < Date.now();
  }

  // Words with a value in an attribute are set here: a marked attribute with {{ }} on a plain
  // element never reaches the page (angular/angular#43260).
  /** What a screen reader says for an invitation's withdraw button. */
  protected withdrawLabel(invitation: InvitationDto): string {
    return $localize`Withdraw the invitation to ${invitation.email}:email:`;
  }

  /** What a screen reader says for a member's role button. */
  protected roleLabel(row: MemberRow): string {
    return $localize`Change ${row.member.name}:memberName:’s role`;
  }

  /** What a screen reader says for a member's teams button. */
  protected teamsLabel(row: MemberRow): string {
    return $localize`Choose ${row.member.name}:memberName:’s teams`;
  }

  /** What a screen reader says for a member's remove button. */
  protected removeLabel(row: MemberRow): string {
    return $localize`Remove ${row.member.name}:memberName: from the club`;
  }

  protected changeRole(row: MemberRow): void {
    this.rowError.set(null);
    this.dialog
      .open<MemberRoleDialog, MemberRoleData, MemberDto>(MemberRoleDialog, {
        ...DIALOG_SIZE,
        data: { member: row.member, self: row.self },
      })
      .afterClosed()
      .subscribe((updated) => {
        if (!updated) return;
        this.members.update((list) => list.map((m) => (m.userId === updated.userId ? updated : m)));
        this.say($localize`${updated.name}:memberName: is now ${ROLE_IN_A_SENTENCE[updated.role]}:role:.`);
        const me = this.me();
        if (row.self && me && updated.role !== 'lead') {
          // No longer a lead: this page is not theirs any more.
          this.auth.updateUser({ ...me, role: updated.role });
          void this.router.navigateByUrl('/');
        }
      });
  }

  protected chooseTeams(row: MemberRow): void {
    this.rowError.set(null);
    this.dialog
      .open<MemberTeamsDialog, MemberTeamsData, TeamDto[]>(MemberTeamsDialog, {
        ...DIALOG_SIZE,
        data: { member: row.member, teams: this.teams() },
      })
      .afterClosed()
      .subscribe((teams) => {
        // Closed by a tap outside: read the teams again, since ticks were saved as they were made.
        if (teams) this.teams.set(teams);
        else this.teamsApi.list().subscribe({ next: (list) => this.teams.set(list) });
      });
  }

  protected removeMember(row: MemberRow): void {
    this.rowError.set(null);
    this.dialog
      .open<RemoveMemberDialog, RemoveMemberData, boolean>(RemoveMemberDialog, {
        ...DIALOG_SIZE,
        data: { member: row.member, clubName: this.me()?.clubName ?? $localize`the club` },
      })
      .afterClosed()
      .subscribe((removed) => {
        if (!removed) return;
        const gone = row.member.userId;
        this.members.update((list) => list.filter((m) => m.userId !== gone));
        this.teams.update((list) =>
          list.map((t) => ({ ...t, coachIds: t.coachIds.filter((id) => id !== gone) })),
        );
        this.say($localize`${row.member.name}:memberName: was removed from the club.`);
      });
  }

  /** Says what a row's action did at the bottom of the screen, near the thumb that tapped it. */
  private say(text: string): void {
    this.snackBar.open(text, undefined, { duration: 4000, politeness: 'polite' });
  }

  protected revoke(invitation: InvitationDto): void {
    this.api.revoke(invitation.id).subscribe({
      next: () => {
        this.invitations.update((list) => list.filter((i) => i.id !== invitation.id));
        this.inviteNotice.set($localize`The invitation to ${invitation.email}:email: no longer works.`);
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
    const { email, role, teamId } = this.form.getRawValue();
    const address = email.trim().toLowerCase();
    this.sending.set(true);
    this.inviteError.set(null);
    this.inviteNotice.set(null);
    this.api.invite(address, role, teamId || null).subscribe({
      next: (invitation) => {
        this.sending.set(false);
        this.invitations.update((list) => [invitation, ...list.filter((i) => i.id !== invitation.id)]);
        const role = ROLE_IN_A_SENTENCE[invitation.role];
        this.inviteNotice.set(
          invitation.teamName
            ? $localize`Invitation sent to ${invitation.email}:email: as ${role}:role: for ${invitation.teamName}:teamName:.`
            : $localize`Invitation sent to ${invitation.email}:email: as ${role}:role:.`,
        );
        this.formDirective().resetForm({ email: '', role, teamId });
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
