import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import {
  DEFAULT_UNITS,
  DISTANCE_UNIT_WORDS,
  DISTANCE_UNITS,
  TEMPERATURE_UNIT_WORDS,
  TEMPERATURE_UNITS,
  type DistanceUnit,
  type TemperatureUnit,
} from '../../../../shared/units';
import { AuthApi } from '../../core/api/auth-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';

/** The select's value for "follow the club" (a select cannot hold null and show it). */
const CLUB = 'club';

const FIELD_WORDS: Record<string, string> = { distanceUnit: 'Distances', temperatureUnit: 'Temperatures' };

/**
 * The person's own units on their account page: each follows the club's setting until they pick
 * one. A change is saved at once and every screen shows it.
 */
@Component({
  selector: 'cw-own-units',
  imports: [FormsModule, MatFormFieldModule, MatSelectModule],
  template: `
    <h2>Units</h2>
    <p class="cw-muted">
      How you read and type distances and temperatures: on plans, the printed card and in e-mails you send.
      Plans are the same whatever you choose.
    </p>
    <div class="cw-own-units">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Distances</mat-label>
        <mat-select
          [ngModel]="distance()"
          (ngModelChange)="save('distanceUnit', $event)"
          [disabled]="saving()"
          data-testid="own-distance-unit"
        >
          <mat-option value="club">As the club: {{ distanceWords[clubUnits().distance] }}</mat-option>
          @for (unit of distanceUnits; track unit) {
            <mat-option [value]="unit">{{ distanceWords[unit] }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>Temperatures</mat-label>
        <mat-select
          [ngModel]="temperature()"
          (ngModelChange)="save('temperatureUnit', $event)"
          [disabled]="saving()"
          data-testid="own-temperature-unit"
        >
          <mat-option value="club">As the club: {{ temperatureWords[clubUnits().temperature] }}</mat-option>
          @for (unit of temperatureUnits; track unit) {
            <mat-option [value]="unit">{{ temperatureWords[unit] }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
    </div>
    <div aria-live="polite">
      @if (saved()) {
        <p role="status" class="cw-muted" data-testid="units-saved">Saved: {{ savedWords() }}.</p>
      }
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </div>
  `,
  styles: `
    .cw-own-units {
      display: flex;
      flex-wrap: wrap;
      gap: 0.75rem;
    }
    .cw-own-units mat-form-field {
      flex: 1 1 12rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OwnUnits {
  private readonly auth = inject(AuthStore);
  private readonly authApi = inject(AuthApi);

  protected readonly distanceUnits = DISTANCE_UNITS;
  protected readonly temperatureUnits = TEMPERATURE_UNITS;
  protected readonly distanceWords = DISTANCE_UNIT_WORDS;
  protected readonly temperatureWords = TEMPERATURE_UNIT_WORDS;
  protected readonly clubUnits = computed(() => this.auth.user()?.clubUnits ?? DEFAULT_UNITS);
  protected readonly distance = computed(() => this.auth.user()?.ownUnits?.distance ?? CLUB);
  protected readonly temperature = computed(() => this.auth.user()?.ownUnits?.temperature ?? CLUB);
  protected readonly saving = signal(false);
  protected readonly saved = signal(false);
  protected readonly error = signal<string | null>(null);
  /** "yards and °F": what the person now reads. */
  protected readonly savedWords = computed(() => {
    const units = this.auth.user()?.units;
    if (!units) return '';
    return `${DISTANCE_UNIT_WORDS[units.distance].toLowerCase()} and ${TEMPERATURE_UNIT_WORDS[units.temperature]}`;
  });

  /** Saves one choice ("club" goes back to following the club). */
  protected save(
    field: 'distanceUnit' | 'temperatureUnit',
    value: DistanceUnit | TemperatureUnit | typeof CLUB,
  ): void {
    if (this.saving()) return;
    this.saving.set(true);
    this.saved.set(false);
    this.error.set(null);
    this.authApi.changeOwnUnits({ [field]: value === CLUB ? null : value }).subscribe({
      next: (user) => {
        this.auth.updateUser(user);
        this.saving.set(false);
        this.saved.set(true);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const fields = Object.entries(problemFieldErrors(error));
        this.error.set(
          fields.length
            ? fields.map(([name, text]) => `${FIELD_WORDS[name] ?? name} ${text}.`).join(' ')
            : problemMessage(error),
        );
      },
    });
  }
}
