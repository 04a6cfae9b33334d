import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { AuthApi } from '../api/auth-api';
import { problemMessage } from '../http/problem-message';

/** What the sign-out question is about. */
export interface SignOutDialogData {
  /** Every device, not only this one. */
  everywhere: boolean;
  /** Pitch-side changes on this device that have not reached the server. */
  unsent: number;
}

/**
 * Asks before signing out when it ends more than this screen: every device, or pitch-side changes
 * not yet sent (signing out clears this device, so they would be lost). Closes with `true` to go
 * on; "everywhere" is asked of the server here, so a failure is said in the dialog and nothing ends.
 */
@Component({
  selector: 'cw-sign-out-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>
      @if (data.everywhere) {
        <ng-container i18n>Sign out on every device?</ng-container>
      } @else {
        <ng-container i18n>Sign out?</ng-container>
      }
    </h2>
    <mat-dialog-content>
      <ul class="cw-consequences">
        @if (data.everywhere) {
          <li i18n>Every phone, tablet and computer signed in as you is signed out, this one too.</li>
        }
        <li i18n>Plans, players and pitch-side records kept on this device are cleared from it.</li>
        @if (data.unsent) {
          <li data-testid="unsent-warning" i18n>
            <strong
              >{data.unsent, plural,
                =1 {1 pitch-side change has}
                other {{{ data.unsent }} pitch-side changes have}
              }
              not reached the server yet</strong
            >
            and will be lost. Wait for a connection to send {data.unsent, plural, =1 {it} other {them}} first.
          </li>
        }
        <li i18n>Everything saved in the club stays.</li>
      </ul>
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close cdkFocusInitial i18n>Stay signed in</button>
      <button
        mat-flat-button
        type="button"
        [class.cw-danger]="data.unsent > 0"
        [disabled]="busy()"
        (click)="confirm()"
        data-testid="confirm-sign-out"
      >
        @if (busy()) {
          <ng-container i18n>Signing out…</ng-container>
        } @else if (data.everywhere) {
          <ng-container i18n>Sign out everywhere</ng-container>
        } @else {
          <ng-container i18n="Signs the person out of this device">Sign out</ng-container>
        }
      </button>
    </mat-dialog-actions>
  `,
  styleUrl: '../../shared/components/confirm-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignOutDialog {
  protected readonly data = inject<SignOutDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<SignOutDialog, boolean>>(MatDialogRef);
  private readonly authApi = inject(AuthApi);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected confirm(): void {
    if (!this.data.everywhere) return this.ref.close(true);
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.authApi.signOutEverywhere().subscribe({
      next: () => this.ref.close(true),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
