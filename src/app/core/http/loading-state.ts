import { computed, Injectable, signal } from '@angular/core';

/** Counts requests in flight so the shell can show one progress bar for all of them. */
@Injectable({ providedIn: 'root' })
export class LoadingState {
  private readonly inFlight = signal(0);

  /** Whether any request is under way. */
  readonly busy = computed(() => this.inFlight() > 0);

  /** Marks a request as started. */
  begin(): void {
    this.inFlight.update((count) => count + 1);
  }

  /** Marks a request as finished. */
  end(): void {
    this.inFlight.update((count) => Math.max(0, count - 1));
  }
}
