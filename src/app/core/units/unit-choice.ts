import { computed, inject, Injectable, signal } from '@angular/core';
import { DEFAULT_UNITS, inUnitsDeep, inUnitsText, type Units } from '../../../../shared/units';
import { AuthStore } from '../auth/auth-store';

/**
 * The units the signed-in person reads and types (their own choice, else the club's), from the
 * signed-in user; metres and °C for anyone else (a session stored before units). A page read by
 * someone not signed in (the helper's view) provides its own UnitChoice and sets the units its
 * link carries with `readAs`.
 */
@Injectable({ providedIn: 'root' })
export class UnitChoice {
  private readonly auth = inject(AuthStore);
  /** Units given by the page itself (a helper link's), which win over the signed-in person's. */
  private readonly given = signal<Units | null>(null);

  /** Distance and temperature units together. */
  readonly units = computed<Units>(() => this.given() ?? this.auth.user()?.units ?? DEFAULT_UNITS);
  readonly distance = computed(() => this.units().distance);
  readonly temperature = computed(() => this.units().temperature);

  /** Reads in these units from now on (for a page whose reader is not signed in). */
  readAs(units: Units): void {
    this.given.set(units);
  }

  /** The engine's metric words ("12 × 20 m", "4 m²", "30 °C") in the reader's units. */
  text(text: string): string {
    return inUnitsText(text, this.units());
  }

  /** Every text inside a plan, notice list or preview in the reader's units; the same value in metres and °C. */
  deep<T>(value: T): T {
    return inUnitsDeep(value, this.units());
  }
}
