import { inject, Injectable, Injector } from '@angular/core';
import type { ComponentType } from '@angular/cdk/portal';
import type { MatDialogConfig } from '@angular/material/dialog';
import { from, type Observable, switchMap } from 'rxjs';

/**
 * Dialogs and short notices whose code (Angular Material's dialog and snack bar, and the dialog
 * itself with its form) is fetched the first time a screen opens one, not with the screen: the
 * plan page reaches a phone sooner on a weak link (issue 12). The service worker keeps these
 * chunks for the offline screens like the rest of their code (server/build/offline-groups.ts).
 */
@Injectable({ providedIn: 'root' })
export class OnDemandOverlays {
  private readonly injector = inject(Injector);

  /** Opens the dialog `load` gives with `config`; emits what it closed with, then completes. */
  open<C, D, R>(
    load: () => Promise<ComponentType<C>>,
    config: MatDialogConfig<D>,
  ): Observable<R | undefined> {
    return from(Promise.all([import('@angular/material/dialog'), load()])).pipe(
      switchMap(([{ MatDialog }, component]) =>
        this.injector.get(MatDialog).open<C, D, R>(component, config).afterClosed(),
      ),
    );
  }

  /** A short notice at the foot of the screen, read out politely by screen readers. */
  notify(words: string, durationMs: number): void {
    void import('@angular/material/snack-bar').then(({ MatSnackBar }) =>
      this.injector.get(MatSnackBar).open(words, undefined, { duration: durationMs, politeness: 'polite' }),
    );
  }
}
