import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { MemberDto } from '../../../../../shared/types';
import { MembersApi } from '../../../core/api/members-api';
import { problemMessage } from '../../../core/http/problem-message';

/** What the lead is asked about: the member and the club's name. */
export interface RemoveMemberData {
  member: MemberDto;
  clubName: string;
}

/**
 * Asks before someone leaves the club for good, and does it. Closes with `true` once the server
 * has removed them; a refusal (the club's last lead) stays in the dialog in plain words.
 */
@Component({
  selector: 'cw-remove-member-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title i18n>Remove {{ data.member.name }} from {{ data.clubName }}?</h2>
    <mat-dialog-content>
      <ul class="cw-consequences">
        <li i18n>{{ data.member.name }} can no longer sign in, from their next tap.</li>
        <li i18n>They come off every team they helped with.</li>
        <li i18n>Plans they made stay with their teams.</li>
      </ul>
      <p i18n>To bring them back, invite them again.</p>
      <div aria-live="polite">
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
      </div>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close cdkFocusInitial i18n>
        Keep {{ data.member.name }}
      </button>
      <button
        mat-flat-button
        type="button"
        class="cw-danger"
        data-testid="confirm-remove-member"
        [disabled]="busy()"
        (click)="removeMember()"
        i18n
      >
        Remove from club
      </button>
    </mat-dialog-actions>
  `,
  styleUrl: '../../../shared/components/confirm-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RemoveMemberDialog {
  private readonly api = inject(MembersApi);
  private readonly ref = inject<MatDialogRef<RemoveMemberDialog, boolean>>(MatDialogRef);
  protected readonly data = inject<RemoveMemberData>(MAT_DIALOG_DATA);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected removeMember(): void {
    this.busy.set(true);
    this.error.set(null);
    this.api.removeMember(this.data.member.userId).subscribe({
      next: () => this.ref.close(true),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
