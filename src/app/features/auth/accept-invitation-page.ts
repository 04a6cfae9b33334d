import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { AuthApi, InvitationLookup } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { controlMessage, showProblem } from '../../core/forms/form-errors';
import { checkAgainstSchema } from '../../core/forms/schema-form';
import { ROLE_IN_A_SENTENCE } from '../../core/labels/role-labels';
import { MIN_PASSWORD_LENGTH, passwordHint } from '../../../../shared/types/password-rules';

const LABELS = { name: $localize`Your name`, password: $localize`Password` };

/** The page an invitation link opens: the invitee sets their name and password and joins. */
@Component({
  selector: 'cw-accept-invitation-page',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatCardModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
  ],
  templateUrl: './accept-invitation-page.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage {
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);

  /** The single-use token of a link e-mailed before it moved into the fragment (/invitations/:tokenInPath). */
  readonly tokenInPath = input<string | undefined>(undefined);
  private readonly route = inject(ActivatedRoute);
  /** The single-use token from the link's fragment (/join#<token>). */
  private readonly tokenInFragment = signal<string | null>(null);
  /** The link's token, wherever it came. */
  protected readonly token = computed(() => this.tokenInFragment() ?? this.tokenInPath() ?? '');

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', Validators.required],
    password: ['', [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)]],
  });
  protected readonly labels = LABELS;
  protected readonly passwordHint = passwordHint();
  protected readonly error = signal<string | null>(null);
  /** Why the link cannot be used (incomplete, used or expired): the page then offers no form. */
  protected readonly linkProblem = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly roleWords = ROLE_IN_A_SENTENCE;
  protected readonly message = controlMessage;
  protected readonly invitation = signal<InvitationLookup | null>(null);

  constructor() {
    this.route.fragment.pipe(takeUntilDestroyed()).subscribe((fragment) => {
      if (!fragment) return;
      this.tokenInFragment.set(fragment);
      // Out of the address bar and history, so it is not shared or bookmarked by mistake.
      void this.router.navigate([], { relativeTo: this.route, replaceUrl: true });
    });
    effect(() => {
      const token = this.token();
      if (!token) {
        this.linkProblem.set(
          $localize`This invitation link is not complete. Open it again from the e-mail, whole.`,
        );
        return;
      }
      this.linkProblem.set(null);
      this.authApi.lookupInvitation(token).subscribe({
        next: (found) => this.invitation.set(found),
        error: () => this.linkProblem.set($localize`This invitation link has been used or has expired.`),
      });
    });
  }

  protected async submit(): Promise<void> {
    // Off from the tap, before the check below waits: a second tap sends nothing.
    if (this.sending()) return;
    this.sending.set(true);
    this.error.set(null);
    const value = this.form.getRawValue();
    const check = await checkAgainstSchema(
      this.form,
      'invitation-accept',
      { token: this.token(), ...value },
      LABELS,
    );
    if (!check.ok) {
      this.sending.set(false);
      this.error.set(check.unmatched.join(' ') || null);
      return;
    }
    this.authApi.acceptInvitation(this.token(), value).subscribe({
      next: (response) => {
        this.auth.signIn(response);
        void this.router.navigateByUrl('/');
      },
      error: (error: unknown) => {
        this.sending.set(false);
        // Errors a field shows under itself are not repeated above the form.
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }
}
