import {
  ChangeDetectionStrategy,
  Component,
  ElementRef,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { Router, RouterLink } from '@angular/router';
import { AuthApi } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { LanguageChoice } from '../../core/locale/language-choice';

type Field = 'email' | 'password';

/** The fields' names, as their labels say. */
const LABELS: Record<Field, string> = { email: $localize`E-mail`, password: $localize`Password` };

/** The same reading of an address as Angular's e-mail validator (WHATWG's "valid e-mail address"). */
const EMAIL =
  /^(?=.{1,254}$)(?=.{1,64}@)[a-zA-Z0-9!#$%&'*+/=?^_`{|}~-]+(?:\.[a-zA-Z0-9!#$%&'*+/=?^_`{|}~-]+)*@[a-zA-Z0-9](?:[a-zA-Z0-9-]{0,61}[a-zA-Z0-9])?(?:\.[a-zA-Z0-9](?:[a-zA-Z0-9-]{0,61}[a-zA-Z0-9])?)*$/;

/**
 * E-mail and password in, a session out. The first screen of every new phone, so it is plain
 * markup and signals: no forms module or Material form fields to fetch and start before it shows.
 * Its fields look and read like the app's others; the server checks everything again.
 */
@Component({
  selector: 'cw-sign-in-page',
  imports: [RouterLink, LanguageChoice],
  templateUrl: './sign-in-page.html',
  styleUrls: ['./auth-page.scss', './sign-in-page.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage {
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);

  /** Where to go after signing in (set by the guard). */
  readonly returnTo = input<string>();

  protected readonly email = signal('');
  protected readonly password = signal('');
  /** A message under each field, from the check below or from the server. */
  protected readonly fieldErrors = signal<Partial<Record<Field, string>>>({});
  protected readonly error = signal<string | null>(null);
  protected readonly sending = signal(false);
  private readonly emailInput = viewChild.required<ElementRef<HTMLInputElement>>('emailInput');
  private readonly passwordInput = viewChild.required<ElementRef<HTMLInputElement>>('passwordInput');

  protected typed(field: Field, event: Event): void {
    (field === 'email' ? this.email : this.password).set((event.target as HTMLInputElement).value);
    if (this.fieldErrors()[field]) this.fieldErrors.update((errors) => ({ ...errors, [field]: undefined }));
  }

  /** The same words as every other form of the app. */
  private check(): Partial<Record<Field, string>> {
    const errors: Partial<Record<Field, string>> = {};
    const email = this.email().trim();
    if (!email) errors.email = $localize`${LABELS.email}:field: is needed.`;
    else if (!EMAIL.test(email))
      errors.email = $localize`${LABELS.email}:field: must be an e-mail address like name@example.org.`;
    if (!this.password()) errors.password = $localize`${LABELS.password}:field: is needed.`;
    return errors;
  }

  protected submit(event: Event): void {
    event.preventDefault();
    // Off from the tap: a second tap sends nothing.
    if (this.sending()) return;
    this.error.set(null);
    const errors = this.check();
    this.fieldErrors.set(errors);
    if (Object.keys(errors).length) {
      (errors.email ? this.emailInput() : this.passwordInput()).nativeElement.focus();
      return;
    }
    this.sending.set(true);
    this.authApi.signIn({ email: this.email().trim(), password: this.password() }).subscribe({
      next: (response) => {
        this.auth.signIn(response);
        void this.router.navigateByUrl(this.returnTo() || '/');
      },
      error: (error: unknown) => {
        this.sending.set(false);
        const fields = problemFieldErrors(error);
        this.fieldErrors.set({ email: fields['email'], password: fields['password'] });
        this.error.set(problemMessage(error));
      },
    });
  }
}
