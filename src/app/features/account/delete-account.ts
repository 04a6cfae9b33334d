import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { DeletionApi } from '../../core/api/deletion-api';
import { SignOut } from '../../core/auth/sign-out';
import { controlMessage, showProblem } from '../../core/forms/form-errors';
import { DeleteAccountDialog } from './delete-account-dialog';

const LABELS = { password: $localize`Your password` } as const;

/**
 * "Delete my account": the person's password, a last question, then the account goes and this
 * device is signed out. The club keeps what they made, under "Former member".
 */
@Component({
  selector: 'cw-delete-account',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 i18n>Delete my account</h2>
    <p class="cw-muted" i18n>
      Your name, e-mail address and password go for good. Plans and rules you made stay with the club, shown
      as made by a former member. The last head of coaching of a club makes someone else head of coaching
      first.
    </p>
    <form class="cw-form-column" [formGroup]="form" (ngSubmit)="ask()" novalidate>
      <mat-form-field appearance="outline">
        <mat-label>{{ labels.password }}</mat-label>
        <input
          matInput
          type="password"
          formControlName="password"
          autocomplete="current-password"
          data-testid="delete-account-password"
        />
        <mat-error>{{ message() }}</mat-error>
      </mat-form-field>
      <div aria-live="polite">
        @if (error(); as text) {
          <p class="cw-form-error" role="alert" data-testid="delete-account-error">{{ text }}</p>
        }
      </div>
      <button
        mat-stroked-button
        type="submit"
        class="cw-danger"
        [disabled]="busy()"
        data-testid="delete-account"
        i18n
      >
        Delete my account
      </button>
    </form>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeleteAccount {
  private readonly api = inject(DeletionApi);
  private readonly dialog = inject(MatDialog);
  private readonly signOut = inject(SignOut);
  protected readonly labels = LABELS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required]],
  });
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected message(): string | null {
    return controlMessage(this.form.controls.password, LABELS.password);
  }

  /** Asks once more, then deletes. */
  protected ask(): void {
    this.error.set(null);
    this.form.markAllAsTouched();
    if (this.form.invalid || this.busy()) return;
    this.dialog
      .open<DeleteAccountDialog, undefined, boolean>(DeleteAccountDialog, { autoFocus: 'dialog' })
      .afterClosed()
      .subscribe((yes) => {
        if (yes) this.remove();
      });
  }

  private remove(): void {
    this.busy.set(true);
    this.api.deleteAccount(this.form.controls.password.value).subscribe({
      next: () => void this.signOut.afterDeletion(),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }
}
