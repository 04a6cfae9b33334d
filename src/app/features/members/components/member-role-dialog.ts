import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatRadioModule } from '@angular/material/radio';
import {
  ROLE_IN_A_SENTENCE,
  ROLE_LABELS,
  ROLES,
  type MemberDto,
  type Role,
} from '../../../../../shared/types';
import { MembersApi } from '../../../core/api/members-api';
import { problemMessage } from '../../../core/http/problem-message';
import { ROLE_DESCRIPTIONS } from '../role-descriptions';

/** What the lead is asked about: the member, and whether it is the lead themselves. */
export interface MemberRoleData {
  member: MemberDto;
  self: boolean;
}

/**
 * Gives a member another role once the lead has picked it and said yes. Closes with the member as
 * the server now holds them; a refusal (the club's last lead) stays in the dialog in plain words.
 */
@Component({
  selector: 'cw-member-role-dialog',
  imports: [FormsModule, MatButtonModule, MatDialogModule, MatRadioModule],
  template: `
    <h2 mat-dialog-title>
      @if (data.self) {
        <ng-container i18n>Your role</ng-container>
      } @else {
        <ng-container i18n>{{ data.member.name }}’s role</ng-container>
      }
    </h2>
    <mat-dialog-content>
      <mat-radio-group
        [(ngModel)]="role"
        class="cw-roles"
        i18n-aria-label="A member's role in the club"
        aria-label="Role"
      >
        @for (choice of roles; track choice) {
          <mat-radio-button [value]="choice" [attr.data-role]="choice">
            <span class="cw-roles__name">{{ labels[choice] }}</span>
            <span class="cw-roles__what">{{ descriptions[choice] }}</span>
          </mat-radio-button>
        }
      </mat-radio-group>
      @if (data.self && data.member.role === 'lead' && role() !== 'lead') {
        <p class="cw-roles__warn" i18n>You will no longer see this page or change the club rules.</p>
      }
      <div aria-live="polite">
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
      </div>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button
        mat-button
        type="button"
        mat-dialog-close
        i18n="Button: keep the member's role, e.g. Keep as a coach"
      >
        Keep as {{ inSentence[data.member.role] }}
      </button>
      <button
        mat-flat-button
        type="button"
        data-testid="confirm-role"
        [disabled]="busy() || role() === data.member.role"
        (click)="saveRole()"
        i18n="Button: give the member the chosen role, e.g. Make an assistant"
      >
        Make {{ inSentence[role()] }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .cw-roles {
      display: flex;
      flex-direction: column;
      gap: 4px;
    }
    .cw-roles__name {
      display: block;
      font-weight: 600;
    }
    .cw-roles__what {
      display: block;
      font-size: 0.9rem;
      color: var(--mat-sys-on-surface-variant);
    }
    .cw-roles__warn {
      color: var(--mat-sys-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MemberRoleDialog {
  private readonly api = inject(MembersApi);
  private readonly ref = inject<MatDialogRef<MemberRoleDialog, MemberDto>>(MatDialogRef);
  protected readonly data = inject<MemberRoleData>(MAT_DIALOG_DATA);
  protected readonly roles = ROLES;
  protected readonly descriptions = ROLE_DESCRIPTIONS;
  protected readonly labels = ROLE_LABELS;
  protected readonly inSentence = ROLE_IN_A_SENTENCE;
  protected readonly role = signal<Role>(this.data.member.role);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected saveRole(): void {
    this.busy.set(true);
    this.error.set(null);
    this.api.changeRole(this.data.member.userId, this.role()).subscribe({
      next: (member) => this.ref.close(member),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
