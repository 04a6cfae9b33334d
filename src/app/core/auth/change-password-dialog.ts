import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { switchMap } from 'rxjs';
import { AuthApi } from '../api/auth-api';
import { controlMessage, showProblem } from '../forms/form-errors';
import { MIN_PASSWORD_LENGTH, passwordHint } from '../../../../shared/types/password-rules';
import { AuthStore } from './auth-store';

const LABELS = {
  currentPassword: $localize`Current password`,
  newPassword: $localize`New password`,
} as const;

/**
 * A new password, given the current one. The server ends every session of the person with it;
 * this device then signs in again with the new password, so only the others are signed out.
 */
@Component({
  selector: 'cw-change-password-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 mat-dialog-title i18n>Change password</h2>
    @if (done()) {
      <mat-dialog-content>
        <p role="status" data-testid="password-changed" i18n>
          Your password is changed. Every other phone, tablet or computer signed in as you is now signed out.
        </p>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-flat-button type="button" mat-dialog-close cdkFocusInitial i18n>Done</button>
      </mat-dialog-actions>
    } @else {
      <form [formGroup]="form" (ngSubmit)="save()" novalidate>
        <mat-dialog-content class="cw-fields">
          <mat-form-field appearance="outline">
            <mat-label>{{ labels.currentPassword }}</mat-label>
            <input
              matInput
              type="password"
              formControlName="currentPassword"
              autocomplete="current-password"
            />
            <mat-error>{{ message('currentPassword') }}</mat-error>
          </mat-form-field>
          <mat-form-field appearance="outline" subscriptSizing="dynamic">
            <mat-label>{{ labels.newPassword }}</mat-label>
            <input matInput type="password" formControlName="newPassword" autocomplete="new-password" />
            <mat-hint i18n>{{ passwordHint }} Other devices will be signed out.</mat-hint>
            <mat-error>{{ message('newPassword') }}</mat-error>
          </mat-form-field>
          @if (error(); as text) {
            <p class="cw-form-error" role="alert">{{ text }}</p>
          }
        </mat-dialog-content>
        <mat-dialog-actions align="end">
          <button mat-button type="button" mat-dialog-close i18n>Cancel</button>
          <button mat-flat-button type="submit" [disabled]="busy()" data-testid="change-password">
            @if (busy()) {
              <ng-container i18n>Changing…</ng-container>
            } @else {
              <ng-container i18n>Change password</ng-container>
            }
          </button>
        </mat-dialog-actions>
      </form>
    }
  `,
  styles: `
    .cw-fields {
      display: grid;
      gap: 12px;
      padding-top: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ChangePasswordDialog {
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);
  protected readonly labels = LABELS;
  protected readonly passwordHint = passwordHint();
  protected readonly form = inject(NonNullableFormBuilder).group({
    currentPassword: ['', [Validators.required]],
    newPassword: ['', [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)]],
  });
  protected readonly busy = signal(false);
  protected readonly done = signal(false);
  protected readonly error = signal<string | null>(null);

  protected message(field: keyof typeof LABELS): string | null {
    return controlMessage(this.form.controls[field], LABELS[field]);
  }

  protected save(): void {
    if (this.busy()) return;
    this.error.set(null);
    const { currentPassword, newPassword } = this.form.getRawValue();
    if (newPassword && newPassword === currentPassword)
      this.form.controls.newPassword.setErrors({
        message: $localize`The new password must differ from the current one.`,
      });
    this.form.markAllAsTouched();
    if (this.form.invalid) return;
    const email = this.auth.user()?.email;
    if (!email) return;
    this.busy.set(true);
    this.authApi
      .changePassword({ currentPassword, newPassword })
      .pipe(switchMap(() => this.authApi.signIn({ email, password: newPassword })))
      .subscribe({
        next: (session) => {
          this.auth.signIn(session);
          this.busy.set(false);
          this.done.set(true);
        },
        error: (error: unknown) => {
          this.busy.set(false);
          this.error.set(showProblem(this.form, error, LABELS));
        },
      });
  }
}
