import { BreakpointObserver } from '@angular/cdk/layout';
import { inject, type Signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { map } from 'rxjs';

/** The shell's phone width: below it the navigation slides over and plan stations fold. */
export const PHONE_WIDTH_QUERY = '(max-width: 840px)';

/** Whether a media query matches, kept current; call where inject() works (a field initializer). */
export function mediaMatches(query: string): Signal<boolean> {
  return toSignal(
    inject(BreakpointObserver)
      .observe(query)
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );
}
