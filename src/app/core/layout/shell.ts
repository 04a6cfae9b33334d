import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, Injector, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenav, MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { AuthApi } from '../api/auth-api';
import { AuthStore } from '../auth/auth-store';
import { forgetDeviceData, unsentPitchSideChanges } from '../auth/device-data';
import type { SignOutDialogData } from '../auth/sign-out-dialog';
import { ICONS } from '../icons/shipped-icon';
import { Brand } from './brand';
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
  private readonly document = inject(DOCUMENT);
  private readonly injector = inject(Injector);
  private readonly authApi = inject(AuthApi);
  protected readonly auth = inject(AuthStore);
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
    (await this.accountDialogs()).changePassword();
  }

  /**
   * Signs out here (or everywhere), asking first when more than this screen ends. The device is
   * cleared and the app restarts on the sign-in page, so nothing of this person stays in memory
   * for whoever picks up a shared club tablet next.
   */
  protected async signOut(everywhere = false): Promise<void> {
    const data: SignOutDialogData = { everywhere, unsent: unsentPitchSideChanges() };
    if (!everywhere && data.unsent === 0) {
      await this.leave(false);
      return;
    }
    (await this.accountDialogs()).confirmSignOut(data).subscribe((confirmed) => {
      if (confirmed) void this.leave(everywhere);
    });
  }

  private async accountDialogs() {
    const { AccountDialogs } = await import('../auth/account-dialogs');
    return this.injector.get(AccountDialogs);
  }

  private async leave(endedOnServer: boolean): Promise<void> {
    // Offline, the token still ends when it expires; clearing the device matters more.
    if (!endedOnServer) await firstValueFrom(this.authApi.signOut()).catch(() => undefined);
    await forgetDeviceData();
    this.auth.signOut();
    this.document.location.assign('/sign-in');
  }
}
