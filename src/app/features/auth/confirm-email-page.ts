import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { ActivatedRoute, Router, RouterLink } from '@angular/router';
import { AuthApi } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemMessage } from '../../core/http/problem-message';

/**
 * Opened from the link mailed to a new account's address. The secret is in the link's fragment
 * (after #): read here, taken out of the address bar and history at once, and sent only in the
 * body of the request that uses it. Works signed in or not (the link may be opened on a laptop).
 */
@Component({
  selector: 'cw-confirm-email-page',
  imports: [RouterLink, MatCardModule, MatButtonModule],
  templateUrl: './confirm-email-page.html',
  styleUrl: './auth-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmEmailPage {
  private readonly authApi = inject(AuthApi);
  private readonly route = inject(ActivatedRoute);
  private readonly router = inject(Router);
  protected readonly auth = inject(AuthStore);

  protected readonly state = signal<'waiting' | 'confirmed' | 'failed' | 'no-link'>('waiting');
  protected readonly error = signal<string | null>(null);

  constructor() {
    this.route.fragment.pipe(takeUntilDestroyed()).subscribe((fragment) => {
      if (!fragment) {
        if (this.state() === 'waiting') this.state.set('no-link');
        return;
      }
      this.state.set('waiting');
      // Out of the address bar and history, so it is not shared or bookmarked by mistake.
      void this.router.navigate([], { relativeTo: this.route, replaceUrl: true });
      this.authApi.confirmEmail(fragment).subscribe({
        next: () => {
          this.state.set('confirmed');
          this.refreshUser();
        },
        error: (error: unknown) => {
          this.error.set(problemMessage(error));
          this.state.set('failed');
        },
      });
    });
  }

  /** The toolbar and the account page stop asking for the confirmation at once. */
  private refreshUser(): void {
    if (!this.auth.signedIn()) return;
    this.authApi.me().subscribe({ next: (user) => this.auth.updateUser(user), error: () => undefined });
  }
}
