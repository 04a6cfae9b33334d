import { ChangeDetectionStrategy, Component, computed, inject, Injector, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenav, MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { AuthStore } from '../auth/auth-store';
import { SignOut } from '../auth/sign-out';
import { ROLE_LABELS } from '../labels/role-labels';
import { ICONS } from '../icons/shipped-icon';
import { Brand } from './brand';
import { EmailConfirmationNotice } from './email-confirmation-notice';
import { mediaMatches, PHONE_WIDTH_QUERY } from './media-query';
import { NAV_ITEMS } from './nav-items';

/**
 * The signed-in frame: toolbar with the account menu, the navigation drawer, and the routed page.
 * Loaded with the first signed-in screen, so the sign-in page and pitch-side never fetch it.
 */
@Component({
  selector: 'cw-shell',
  imports: [
    RouterOutlet,
    RouterLink,
    Brand,
    EmailConfirmationNotice,
    RouterLinkActive,
    MatToolbarModule,
    MatSidenavModule,
    ...ICONS,
    MatButtonModule,
    MatMenuModule,
  ],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly injector = inject(Injector);
  protected readonly auth = inject(AuthStore);
  /** Signing out, here or everywhere (shared with the account page). */
  protected readonly signOut = inject(SignOut);
  protected readonly roleLabels = ROLE_LABELS;
  private readonly drawer = viewChild(MatSidenav);

  /** Phones get a drawer that slides over; wider screens keep the navigation open. */
  protected readonly compact = mediaMatches(PHONE_WIDTH_QUERY);

  protected readonly navItems = computed(() =>
    NAV_ITEMS.filter((item) => !item.roles || this.auth.hasRole(...item.roles)),
  );

  /** Closes the drawer after navigating on a phone. */
  protected closeDrawerOnPhone(): void {
    if (this.compact()) void this.drawer()?.close();
  }

  protected async changePassword(): Promise<void> {
    // Loaded when first opened: the shell does not carry forms and dialog code.
    const { AccountDialogs } = await import('../auth/account-dialogs');
    this.injector.get(AccountDialogs).changePassword();
  }
}
