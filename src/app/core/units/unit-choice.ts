import { computed, inject, Injectable } from '@angular/core';
import { DEFAULT_UNITS, type Units } from '../../../../shared/units';
import { AuthStore } from '../auth/auth-store';

/**
 * The units the signed-in person reads and types (their own choice, else the club's), from the
 * signed-in user; metres and °C for anyone else (a helper's view, a session stored before units).
 */
@Injectable({ providedIn: 'root' })
export class UnitChoice {
  private readonly auth = inject(AuthStore);

  /** Distance and temperature units together. */
  readonly units = computed<Units>(() => this.auth.user()?.units ?? DEFAULT_UNITS);
  readonly distance = computed(() => this.units().distance);
  readonly temperature = computed(() => this.units().temperature);
}
