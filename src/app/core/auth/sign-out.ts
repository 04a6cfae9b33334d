import { DOCUMENT } from '@angular/common';
import { inject, Injectable, Injector } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { AuthApi } from '../api/auth-api';
import { AuthStore } from './auth-store';
import { forgetDeviceData, unsentPitchSideChanges } from './device-data';
import type { SignOutDialogData } from './sign-out-dialog';

/**
 * Signing out, here or on every device: the one place for it (the account menu and the account
 * page both call it). Asks first when more than this screen ends; then ends the token on the
 * server, clears the device and restarts the app on the sign-in page, so nothing of this person
 * stays in memory for whoever picks up a shared club tablet next.
 */
@Injectable({ providedIn: 'root' })
export class SignOut {
  private readonly document = inject(DOCUMENT);
  private readonly injector = inject(Injector);
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);

  /** Signs out of this device, or of every device, asking first when needed. */
  async start(everywhere = false): Promise<void> {
    const data: SignOutDialogData = { everywhere, unsent: unsentPitchSideChanges() };
    if (!everywhere && data.unsent === 0) {
      await this.leave(false);
      return;
    }
    // The dialogs load when first asked for, so they are not part of every signed-in screen's start.
    const { AccountDialogs } = await import('./account-dialogs');
    this.injector
      .get(AccountDialogs)
      .confirmSignOut(data)
      .subscribe((confirmed) => {
        // The dialog asked the server to end every session before it closed with yes.
        if (confirmed) void this.leave(everywhere);
      });
  }

  /** After the account or club is deleted on the server: clears the device, opens sign-in. */
  afterDeletion(): Promise<void> {
    return this.leave(true);
  }

  private async leave(endedOnServer: boolean): Promise<void> {
    // Offline, the token still ends when it expires; clearing the device matters more.
    if (!endedOnServer) await firstValueFrom(this.authApi.signOut()).catch(() => undefined);
    await forgetDeviceData();
    this.auth.signOut();
    this.document.location.assign('/sign-in');
  }
}
