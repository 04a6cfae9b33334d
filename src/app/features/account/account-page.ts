import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { AuthApi } from '../../core/api/auth-api';
import { AccountDialogs } from '../../core/auth/account-dialogs';
import { AuthStore } from '../../core/auth/auth-store';
import { SignOut } from '../../core/auth/sign-out';
import { controlMessage, showProblem } from '../../core/forms/form-errors';
import { checkAgainstSchema } from '../../core/forms/schema-form';
import { ICONS } from '../../core/icons/shipped-icon';
import { ROLE_LABELS } from '../../core/labels/role-labels';
import { DeleteAccount } from './delete-account';
import { OwnUnits } from './own-units';
import { LanguageChoice } from '../../core/locale/language-choice';

const LABELS = { name: $localize`Your name` } as const;

/**
 * The signed-in person's own page: their name (which they change here), e-mail address, club and
 * role, a new password, and signing out here or on every device.
 */
@Component({
  selector: 'cw-account-page',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatButtonModule,
    MatCardModule,
    MatFormFieldModule,
    MatInputModule,
    ...ICONS,
    OwnUnits,
    DeleteAccount,
    LanguageChoice,
  ],
  templateUrl: './account-page.html',
  styleUrl: './account-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountPage {
  private readonly authApi = inject(AuthApi);
  private readonly dialogs = inject(AccountDialogs);
  protected readonly auth = inject(AuthStore);
  /** Signing out, here or everywhere (the same as the account menu's). */
  protected readonly signOut = inject(SignOut);

  protected readonly labels = LABELS;
  protected readonly roleLabels = ROLE_LABELS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.auth.user()?.name ?? ''],
  });
  private readonly typedName = toSignal(this.form.controls.name.valueChanges, {
    initialValue: this.form.controls.name.value,
  });
  /** Whether the field holds something other than the saved name. */
  protected readonly nameChanged = computed(() => this.typedName().trim() !== (this.auth.user()?.name ?? ''));
  /** True from the tap on "Save" until the answer. */
  protected readonly saving = signal(false);
  protected readonly saved = signal(false);
  protected readonly error = signal<string | null>(null);

  protected message(): string | null {
    return controlMessage(this.form.controls.name, LABELS.name);
  }

  /** Sends the new name; the toolbar and every screen show it as soon as the server has it. */
  protected async saveName(): Promise<void> {
    if (this.saving() || !this.nameChanged()) return;
    this.saving.set(true);
    this.saved.set(false);
    this.error.set(null);
    const name = this.form.controls.name.value.trim();
    const check = await checkAgainstSchema(this.form, 'auth-me-update', { name }, LABELS);
    if (!check.ok) {
      this.saving.set(false);
      this.error.set(check.unmatched.join(' ') || null);
      return;
    }
    this.authApi.changeName(name).subscribe({
      next: (user) => {
        this.auth.updateUser(user);
        this.form.reset({ name: user.name });
        this.saving.set(false);
        this.saved.set(true);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }

  protected changePassword(): void {
    this.dialogs.changePassword();
  }
}
