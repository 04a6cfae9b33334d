import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import type { Observable } from 'rxjs';
import { AuthApi } from '../../core/api/auth-api';
import { applyFieldErrors, controlMessage } from '../../core/forms/form-errors';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { MIN_PASSWORD_LENGTH, passwordHint } from '../../../../shared/types/password-rules';

const LABELS = { email: $localize`E-mail`, password: $localize`New password` } as const;

/**
 * A forgotten password: ask for a link by e-mail, then, opened from that link, choose a new one.
 * The link's secret is in its fragment (after #): it is read here, taken out of the address bar
 * and history at once, and sent only in the body of the request that uses it.
 */
@Component({
  selector: 'cw-reset-password-page',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatCardModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
  ],
  templateUrl: './reset-password-page.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage {
  private readonly authApi = inject(AuthApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  private readonly formBuilder = inject(NonNullableFormBuilder);

  /** The e-mailed link's token, or null when the page was opened to ask for a link. */
  protected readonly token = signal<string | null>(null);
  protected readonly labels = LABELS;
  protected readonly passwordHint = passwordHint();
  protected readonly askForm = this.formBuilder.group({
    email: ['', [Validators.required, Validators.email]],
  });
  protected readonly chooseForm = this.formBuilder.group({
    password: ['', [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)]],
  });
  protected readonly sending = signal(false);
  protected readonly error = signal<string | null>(null);
  /** The server's answer to a request for a link. */
  protected readonly asked = signal<string | null>(null);
  protected readonly changed = signal(false);
  protected readonly message = controlMessage;

  constructor() {
    this.route.fragment.pipe(takeUntilDestroyed()).subscribe((fragment) => {
      if (!fragment) return;
      this.token.set(fragment);
      this.asked.set(null);
      this.changed.set(false);
      this.error.set(null);
      // Out of the address bar and history, so it is not shared or bookmarked by mistake.
      void this.router.navigate([], { relativeTo: this.route, replaceUrl: true });
    });
  }

  /** Back to asking for a link, after an unusable one. */
  protected askAgain(): void {
    this.token.set(null);
    this.error.set(null);
    this.asked.set(null);
  }

  protected ask(): void {
    if (this.sending()) return;
    this.askForm.markAllAsTouched();
    if (this.askForm.invalid) return;
    this.send(this.authApi.requestPasswordReset(this.askForm.getRawValue().email), (answer) =>
      this.asked.set(answer.message),
    );
  }

  protected choose(): void {
    const token = this.token();
    if (this.sending() || !token) return;
    this.chooseForm.markAllAsTouched();
    if (this.chooseForm.invalid) return;
    this.send(this.authApi.confirmPasswordReset(token, this.chooseForm.getRawValue().password), () =>
      this.changed.set(true),
    );
  }

  private send<T>(request: Observable<T>, done: (answer: T) => void): void {
    this.sending.set(true);
    this.error.set(null);
    request.subscribe({
      next: (answer) => {
        this.sending.set(false);
        done(answer);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const fields = problemFieldErrors(error);
        // A used or out-of-date link is said in full above the form; field words go under fields.
        if (!fields['token']) applyFieldErrors(this.token() ? this.chooseForm : this.askForm, fields);
        this.error.set(problemMessage(error, { fields: false }));
      },
    });
  }
}
