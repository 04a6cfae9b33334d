import { ApplicationRef, DestroyRef, inject, Injectable, signal } from '@angular/core';

/**
 * Whether the page is being printed. Screens that leave parts undrawn until needed (folded
 * station cards, later phases) draw everything for paper: the browser's `beforeprint` comes just
 * before it lays the page out for print, so the change is drawn at once (a synchronous tick), and
 * a switch to print media (print preview, emulation) does the same.
 */
@Injectable({ providedIn: 'root' })
export class PrintState {
  private readonly appRef = inject(ApplicationRef);
  readonly printing = signal(false);

  constructor() {
    // Absent where there is no rendering engine (a test DOM): then only beforeprint/afterprint count.
    const media = typeof matchMedia === 'function' ? matchMedia('print') : null;
    const set = (printing: boolean) => {
      if (this.printing() === printing) return;
      this.printing.set(printing);
      if (printing) this.appRef.tick();
    };
    const before = () => set(true);
    const after = () => set(media?.matches ?? false);
    const change = () => set(media?.matches ?? false);
    addEventListener('beforeprint', before);
    addEventListener('afterprint', after);
    media?.addEventListener('change', change);
    inject(DestroyRef).onDestroy(() => {
      removeEventListener('beforeprint', before);
      removeEventListener('afterprint', after);
      media?.removeEventListener('change', change);
    });
  }
}
