import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';

/** The last question before an account is deleted; closes with true to go ahead. */
@Component({
  selector: 'cw-delete-account-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title i18n>Delete your account for good?</h2>
    <mat-dialog-content>
      <ul class="cw-consequences">
        <li i18n>You can no longer sign in, here or on any other device.</li>
        <li i18n>You come off every team you helped with.</li>
        <li i18n>Plans and rules you made stay with the club, shown as made by a former member.</li>
      </ul>
      <p i18n>This cannot be undone.</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" cdkFocusInitial i18n>
        Keep my account
      </button>
      <button
        mat-flat-button
        type="button"
        class="cw-danger"
        [mat-dialog-close]="true"
        data-testid="confirm-delete-account"
        i18n
      >
        Delete my account
      </button>
    </mat-dialog-actions>
  `,
  styleUrl: '../../shared/components/confirm-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeleteAccountDialog {}
