import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import type { UserDto } from '../../../../shared/types';
import { DEFAULT_UNITS, DISTANCE_UNIT_WORDS, TEMPERATURE_UNIT_WORDS } from '../../../../shared/units';
import { AuthApi } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { InstantSave } from '../../core/forms/instant-save';
import { FOLLOW_CLUB, UnitFields, unitProblem, type UnitPick } from '../../shared/components/unit-fields';

const FIELD_WORDS: Record<string, string> = {
  distanceUnit: $localize`Distances`,
  temperatureUnit: $localize`Temperatures`,
};

/**
 * The person's own units on their account page: each follows the club's setting until they pick
 * one. A change is saved at once and every screen shows it.
 */
@Component({
  selector: 'cw-own-units',
  imports: [UnitFields],
  template: `
    <h2 i18n>Units</h2>
    <p class="cw-muted" i18n>
      How you read and type distances and temperatures: on plans, the printed card and in e-mails you send.
      Plans are the same whatever you choose.
    </p>
    <cw-unit-fields
      [distance]="distance()"
      [temperature]="temperature()"
      [club]="clubUnits()"
      [disabled]="setting.saving()"
      testIdPrefix="own"
      (picked)="save($event)"
    />
    <div aria-live="polite">
      @if (setting.saved()) {
        <p role="status" class="cw-muted" data-testid="units-saved" i18n>Saved: {{ savedWords() }}.</p>
      }
      @if (setting.error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OwnUnits {
  private readonly auth = inject(AuthStore);
  private readonly authApi = inject(AuthApi);

  protected readonly clubUnits = computed(() => this.auth.user()?.clubUnits ?? DEFAULT_UNITS);
  protected readonly distance = computed(() => this.auth.user()?.ownUnits?.distance ?? FOLLOW_CLUB);
  protected readonly temperature = computed(() => this.auth.user()?.ownUnits?.temperature ?? FOLLOW_CLUB);
  protected readonly setting = new InstantSave<UserDto>((error) => unitProblem(error, FIELD_WORDS));
  /** "yards and °F": what the person now reads. */
  protected readonly savedWords = computed(() => {
    const units = this.auth.user()?.units;
    if (!units) return '';
    const distance = DISTANCE_UNIT_WORDS[units.distance].toLowerCase();
    const temperature = TEMPERATURE_UNIT_WORDS[units.temperature];
    return $localize`:The units a person reads, e.g. yards and °F:${distance}:distance: and ${temperature}:temperature:`;
  });

  /** Saves one choice ("club" goes back to following the club). */
  protected save(pick: UnitPick): void {
    const field = pick.quantity === 'distance' ? 'distanceUnit' : 'temperatureUnit';
    this.setting.save(
      () => this.authApi.changeOwnUnits({ [field]: pick.unit === FOLLOW_CLUB ? null : pick.unit }),
      (user) => this.auth.updateUser(user),
    );
  }
}
