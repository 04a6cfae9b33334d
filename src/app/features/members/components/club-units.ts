import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import {
  DISTANCE_UNIT_WORDS,
  DISTANCE_UNITS,
  TEMPERATURE_UNIT_WORDS,
  TEMPERATURE_UNITS,
  type Units,
} from '../../../../../shared/units';
import { AuthApi } from '../../../core/api/auth-api';
import { ClubUnitsApi } from '../../../core/api/club-units-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { problemFieldErrors, problemMessage } from '../../../core/http/problem-message';

const FIELD_WORDS: Record<string, string> = { distance: 'Distances', temperature: 'Temperatures' };

/**
 * The club's units, on the head of coaching's club page: what everyone in the club reads and
 * types unless they choose their own on their account page. Saved at once.
 */
@Component({
  selector: 'cw-club-units',
  imports: [FormsModule, MatCardModule, MatFormFieldModule, MatSelectModule],
  template: `
    <mat-card appearance="outlined" class="cw-club-units">
      <mat-card-header><h2 mat-card-title>Club units</h2></mat-card-header>
      <mat-card-content>
        <p class="cw-muted">
          What everyone in the club reads and types for distances and temperatures: the plan wizard, plans,
          pitch-side, the printed card and e-mails. Anyone can choose their own on their account page. Plans
          are the same whatever you choose.
        </p>
        @if (units(); as current) {
          <div class="cw-club-units__fields">
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Distances</mat-label>
              <mat-select
                [ngModel]="current.distance"
                (ngModelChange)="save({ distance: $event })"
                [disabled]="saving()"
                data-testid="club-distance-unit"
              >
                @for (unit of distanceUnits; track unit) {
                  <mat-option [value]="unit">{{ distanceWords[unit] }}</mat-option>
                }
              </mat-select>
            </mat-form-field>
            <mat-form-field appearance="outline" subscriptSizing="dynamic">
              <mat-label>Temperatures</mat-label>
              <mat-select
                [ngModel]="current.temperature"
                (ngModelChange)="save({ temperature: $event })"
                [disabled]="saving()"
                data-testid="club-temperature-unit"
              >
                @for (unit of temperatureUnits; track unit) {
                  <mat-option [value]="unit">{{ temperatureWords[unit] }}</mat-option>
                }
              </mat-select>
            </mat-form-field>
          </div>
        }
        <div aria-live="polite">
          @if (saved()) {
            <p role="status" class="cw-muted" data-testid="club-units-saved">Saved for the club.</p>
          }
          @if (error(); as text) {
            <p class="cw-form-error" role="alert">{{ text }}</p>
          }
        </div>
      </mat-card-content>
    </mat-card>
  `,
  styles: `
    .cw-club-units {
      margin-top: 1.5rem;
    }
    .cw-club-units__fields {
      display: flex;
      flex-wrap: wrap;
      gap: 0.75rem;
    }
    .cw-club-units__fields mat-form-field {
      flex: 1 1 12rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubUnits {
  private readonly api = inject(ClubUnitsApi);
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);

  protected readonly distanceUnits = DISTANCE_UNITS;
  protected readonly temperatureUnits = TEMPERATURE_UNITS;
  protected readonly distanceWords = DISTANCE_UNIT_WORDS;
  protected readonly temperatureWords = TEMPERATURE_UNIT_WORDS;
  protected readonly units = signal<Units | null>(null);
  protected readonly saving = signal(false);
  protected readonly saved = signal(false);
  protected readonly error = signal<string | null>(null);

  constructor() {
    this.api.get().subscribe({
      next: (units) => this.units.set(units),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  /** Saves one unit for the club, then reads the signed-in person again so every screen follows. */
  protected save(change: Partial<Units>): void {
    if (this.saving()) return;
    this.saving.set(true);
    this.saved.set(false);
    this.error.set(null);
    this.api.set(change).subscribe({
      next: (units) => {
        this.units.set(units);
        this.saving.set(false);
        this.saved.set(true);
        this.authApi.me().subscribe({ next: (user) => this.auth.updateUser(user) });
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
