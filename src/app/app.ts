import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterOutlet } from '@angular/router';
import { LoadingState } from './core/http/loading-state';

/**
 * The root: one progress bar for every request, and the routed frame — the public pages' light
 * header, the signed-in shell, or a full-screen page (pitch-side, the helper's view).
 */
@Component({
  selector: 'cw-root',
  imports: [RouterOutlet, MatProgressBar],
  template: `
    @if (loading.busy()) {
      <mat-progress-bar class="cw-progress cw-no-print" mode="indeterminate" aria-label="Loading" />
    }
    <router-outlet />
  `,
  styles: `
    .cw-progress {
      position: fixed;
      inset: 0 0 auto 0;
      z-index: 10;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly loading = inject(LoadingState);
}
