import { InjectionToken } from '@angular/core';

/** Runs `work` at the browser's next quiet moment (within 300 ms at the latest). */
export type WhenIdle = (work: () => void) => void;

/**
 * The browser's idle callback (a short timer where there is none). A token, so a test can step
 * through work the page leaves for later, one quiet moment at a time.
 */
export const WHEN_IDLE = new InjectionToken<WhenIdle>('WHEN_IDLE', {
  providedIn: 'root',
  factory: () => (work) => {
    if (typeof requestIdleCallback === 'function') requestIdleCallback(work, { timeout: 300 });
    else setTimeout(work, 16);
  },
});
