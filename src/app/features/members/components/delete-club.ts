import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { DeletionApi } from '../../../core/api/deletion-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { SignOut } from '../../../core/auth/sign-out';
import { showProblem } from '../../../core/forms/form-errors';

const LABELS = { clubName: $localize`The club's name` } as const;

/**
 * The danger zone of the Members page (head of coaching only): the whole club goes for good once
 * its name is typed exactly, and everyone in it is signed out.
 */
@Component({
  selector: 'cw-delete-club',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule],
  template: `
    <section class="cw-delete-club" aria-labelledby="cw-delete-club-title">
      <h2 id="cw-delete-club-title" i18n>Delete the club</h2>
      <p i18n>
        Everything {{ clubName() }} holds goes for good: its teams, players, registers, plans, feedback,
        rules, invitations and every member's account. Everyone in the club is signed out. Download what you
        want to keep first.
      </p>
      <form class="cw-form-column" [formGroup]="form" (ngSubmit)="remove()" novalidate>
        <mat-form-field appearance="outline">
          <mat-label i18n>Type the club's name to confirm</mat-label>
          <input matInput formControlName="clubName" autocomplete="off" data-testid="delete-club-name" />
          <mat-hint i18n>Exactly as it is written: {{ clubName() }}</mat-hint>
          <mat-error>{{ form.controls.clubName.errors?.['message'] }}</mat-error>
        </mat-form-field>
        <div aria-live="polite">
          @if (error(); as text) {
            <p class="cw-form-error" role="alert">{{ text }}</p>
          }
        </div>
        <button
          mat-flat-button
          type="submit"
          class="cw-danger"
          [disabled]="!matches() || busy()"
          data-testid="delete-club"
          i18n
        >
          Delete the club for good
        </button>
      </form>
    </section>
  `,
  styles: `
    .cw-delete-club {
      border: 2px solid var(--mat-sys-error);
      border-radius: 12px;
      padding: 12px 16px;
      margin-top: 24px;
      h2 {
        margin: 0 0 6px;
        color: var(--mat-sys-error);
      }
      form {
        max-width: 480px;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeleteClub {
  private readonly api = inject(DeletionApi);
  private readonly auth = inject(AuthStore);
  private readonly signOut = inject(SignOut);
  protected readonly clubName = computed(() => this.auth.user()?.clubName ?? '');
  protected readonly form = inject(NonNullableFormBuilder).group({ clubName: [''] });
  private readonly typed = toSignal(this.form.controls.clubName.valueChanges, { initialValue: '' });
  /** The button wakes only once the name is typed exactly (the server checks again). */
  protected readonly matches = computed(
    () => this.typed().trim() === this.clubName().trim() && !!this.clubName(),
  );
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected remove(): void {
    if (!this.matches() || this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.api.deleteClub(this.form.controls.clubName.value).subscribe({
      next: () => void this.signOut.afterDeletion(),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }
}
