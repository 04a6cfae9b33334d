import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { AuthApi } from '../api/auth-api';
import { AuthStore } from '../auth/auth-store';
import { problemMessage } from '../http/problem-message';

/**
 * Above every signed-in screen until the person confirms their e-mail address: what it is for,
 * and a button for another link. Nothing is shown once confirmed (or for sessions saved before
 * the server said, which it only says of accounts that still need it).
 */
@Component({
  selector: 'cw-email-confirmation-notice',
  imports: [MatButtonModule],
  template: `
    @if (email(); as address) {
      <aside
        class="cw-confirm-notice cw-no-print"
        aria-label="E-mail address"
        i18n-aria-label
        data-testid="confirm-notice"
      >
        <p i18n>
          <strong>Confirm your e-mail address.</strong> Open the link we sent to {{ address }}. Until then you
          can plan, but not invite people or e-mail plans.
        </p>
        @if (answer(); as text) {
          <p role="status" data-testid="confirm-notice-answer">{{ text }}</p>
        } @else {
          <button
            mat-stroked-button
            type="button"
            [disabled]="sending()"
            (click)="resend()"
            data-testid="confirm-resend"
          >
            @if (sending()) {
              <ng-container i18n>Sending…</ng-container>
            } @else {
              <ng-container i18n>Send the link again</ng-container>
            }
          </button>
        }
      </aside>
    }
  `,
  styles: `
    .cw-confirm-notice {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px 16px;
      margin: 12px 16px 0;
      padding: 12px 16px;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    .cw-confirm-notice p {
      margin: 0;
      flex: 1 1 240px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EmailConfirmationNotice {
  private readonly auth = inject(AuthStore);
  private readonly authApi = inject(AuthApi);

  /** The address still to confirm, or null. */
  protected readonly email = computed(() => {
    const user = this.auth.user();
    return user && user.emailVerified === false ? user.email : null;
  });
  protected readonly sending = signal(false);
  protected readonly answer = signal<string | null>(null);

  protected resend(): void {
    if (this.sending()) return;
    this.sending.set(true);
    this.authApi.resendEmailConfirmation().subscribe({
      next: (reply) => {
        this.sending.set(false);
        this.answer.set(reply.message);
        if (reply.outcome === 'confirmed') this.refresh();
      },
      error: (error: unknown) => {
        this.sending.set(false);
        this.answer.set(problemMessage(error));
      },
    });
  }

  /** Confirmed on another device: take the notice away. */
  private refresh(): void {
    this.authApi.me().subscribe({ next: (user) => this.auth.updateUser(user), error: () => undefined });
  }
}
