import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { Router, RouterLink } from '@angular/router';
import { AuthApi } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { controlMessage, showProblem } from '../../core/forms/form-errors';
import { checkAgainstSchema } from '../../core/forms/schema-form';
import { MIN_PASSWORD_LENGTH, passwordHint } from '../../../../shared/types/password-rules';

const LABELS = {
  clubName: $localize`Club name`,
  name: $localize`Your name`,
  email: $localize`E-mail`,
  password: $localize`Password`,
};

/** Creates a club with the person signing up as its lead. */
@Component({
  selector: 'cw-create-club-page',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatCardModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
  ],
  templateUrl: './create-club-page.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CreateClubPage {
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);

  protected readonly form = inject(NonNullableFormBuilder).group({
    clubName: ['', Validators.required],
    name: ['', Validators.required],
    email: ['', [Validators.required, Validators.email]],
    password: ['', [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)]],
  });
  protected readonly labels = LABELS;
  protected readonly passwordHint = passwordHint();
  protected readonly error = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly message = controlMessage;

  protected async submit(): Promise<void> {
    // Off from the tap, before the check below waits: a second tap sends nothing.
    if (this.sending()) return;
    this.sending.set(true);
    this.error.set(null);
    const value = this.form.getRawValue();
    const check = await checkAgainstSchema(this.form, 'auth-register', value, LABELS);
    if (!check.ok) {
      this.sending.set(false);
      this.error.set(check.unmatched.join(' ') || null);
      return;
    }
    this.authApi.createClub(value).subscribe({
      next: (response) => {
        this.auth.signIn(response);
        void this.router.navigateByUrl('/teams');
      },
      error: (error: unknown) => {
        this.sending.set(false);
        // Errors a field shows under itself are not repeated above the form.
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }
}
