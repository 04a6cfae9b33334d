import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { RouterOutlet } from '@angular/router';
import { LoadingState } from './core/http/loading-state';

/**
 * The root: one progress bar for every request, and the routed frame — the public pages' light
 * header, the signed-in shell, or a full-screen page (pitch-side, the helper's view). The bar is
 * plain markup in the theme's colour: the first screen starts without Material's progress bar.
 */
@Component({
  selector: 'cw-root',
  imports: [RouterOutlet],
  template: `
    @if (loading.busy()) {
      <div class="cw-progress cw-no-print" role="progressbar" aria-label="Loading" i18n-aria-label>
        <div class="cw-progress__bar"></div>
      </div>
    }
    <router-outlet />
  `,
  styles: `
    .cw-progress {
      position: fixed;
      inset: 0 0 auto 0;
      z-index: 10;
      height: 4px;
      overflow: hidden;
      background: color-mix(in srgb, var(--mat-sys-primary) 25%, transparent);
    }
    .cw-progress__bar {
      width: 40%;
      height: 100%;
      background: var(--mat-sys-primary);
      animation: cw-progress-slide 1.2s ease-in-out infinite;
    }
    @keyframes cw-progress-slide {
      from {
        transform: translateX(-100%);
      }
      to {
        transform: translateX(250%);
      }
    }
    @media (prefers-reduced-motion: reduce) {
      .cw-progress__bar {
        width: 100%;
        animation: none;
        opacity: 0.6;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class App {
  protected readonly loading = inject(LoadingState);
}
