import { inject, Injectable } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import type { Observable } from 'rxjs';
import { ChangePasswordDialog } from './change-password-dialog';
import { SignOutDialog, type SignOutDialogData } from './sign-out-dialog';

/**
 * The account menu's dialogs. The shell fetches this file when one is first asked for, so its
 * forms and dialog code are not part of every signed-in screen's start.
 */
@Injectable({ providedIn: 'root' })
export class AccountDialogs {
  private readonly dialog = inject(MatDialog);

  changePassword(): void {
    this.dialog.open(ChangePasswordDialog, { width: '420px', maxWidth: '95vw' });
  }

  /** Emits true when the person confirms signing out. */
  confirmSignOut(data: SignOutDialogData): Observable<boolean | undefined> {
    return this.dialog
      .open<SignOutDialog, SignOutDialogData, boolean>(SignOutDialog, { data, maxWidth: '95vw' })
      .afterClosed();
  }
}
