import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import {
  DISTANCE_UNIT_WORDS,
  DISTANCE_UNITS,
  TEMPERATURE_UNIT_WORDS,
  TEMPERATURE_UNITS,
  type DistanceUnit,
  type TemperatureUnit,
  type Units,
} from '../../../../shared/units';
import { problemFieldSentences, problemMessage } from '../../core/http/problem-message';

/** The select's value for "follow the club" (a select cannot hold null and show it). */
export const FOLLOW_CLUB = 'club';

/** One pick in the unit fields: which quantity, and a unit or "follow the club". */
export type UnitPick =
  | { quantity: 'distance'; unit: DistanceUnit | typeof FOLLOW_CLUB }
  | { quantity: 'temperature'; unit: TemperatureUnit | typeof FOLLOW_CLUB };

/**
 * The two unit selects, Distances and Temperatures, as the club page and the account page both
 * show them. With `club` set, each also offers "As the club: …" (a person's own choice).
 */
@Component({
  selector: 'cw-unit-fields',
  imports: [FormsModule, MatFormFieldModule, MatSelectModule],
  template: `
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label i18n>Distances</mat-label>
      <mat-select
        [ngModel]="distance()"
        (ngModelChange)="picked.emit({ quantity: 'distance', unit: $event })"
        [disabled]="disabled()"
        [attr.data-testid]="testIdPrefix() + '-distance-unit'"
      >
        @if (club(); as club) {
          <mat-option
            value="club"
            i18n="A person's unit choice that follows the club's, e.g. As the club: Metres"
            >As the club: {{ distanceWords[club.distance] }}</mat-option
          >
        }
        @for (unit of distanceUnits; track unit) {
          <mat-option [value]="unit">{{ distanceWords[unit] }}</mat-option>
        }
      </mat-select>
    </mat-form-field>
    <mat-form-field appearance="outline" subscriptSizing="dynamic">
      <mat-label i18n>Temperatures</mat-label>
      <mat-select
        [ngModel]="temperature()"
        (ngModelChange)="picked.emit({ quantity: 'temperature', unit: $event })"
        [disabled]="disabled()"
        [attr.data-testid]="testIdPrefix() + '-temperature-unit'"
      >
        @if (club(); as club) {
          <mat-option value="club" i18n="A person's unit choice that follows the club's, e.g. As the club: °C"
            >As the club: {{ temperatureWords[club.temperature] }}</mat-option
          >
        }
        @for (unit of temperatureUnits; track unit) {
          <mat-option [value]="unit">{{ temperatureWords[unit] }}</mat-option>
        }
      </mat-select>
    </mat-form-field>
  `,
  styles: `
    :host {
      display: flex;
      flex-wrap: wrap;
      gap: 0.75rem;
    }
    // Side by side where both fit their longest choice ("As the club: Degrees Celsius (°C)").
    mat-form-field {
      flex: 1 1 16rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UnitFields {
  /** The distance unit shown, or "club" when the person follows the club. */
  readonly distance = input.required<DistanceUnit | typeof FOLLOW_CLUB>();
  readonly temperature = input.required<TemperatureUnit | typeof FOLLOW_CLUB>();
  /** The club's units, to offer following them; null on the club's own setting. */
  readonly club = input<Units | null>(null);
  readonly disabled = input(false);
  /** Names the selects for tests: "club" gives club-distance-unit and club-temperature-unit. */
  readonly testIdPrefix = input.required<string>();
  readonly picked = output<UnitPick>();

  protected readonly distanceUnits = DISTANCE_UNITS;
  protected readonly temperatureUnits = TEMPERATURE_UNITS;
  protected readonly distanceWords = DISTANCE_UNIT_WORDS;
  protected readonly temperatureWords = TEMPERATURE_UNIT_WORDS;
}

/** A refused unit change in words: "Distances must be metres or yards." (field names as the selects say). */
export function unitProblem(error: unknown, fieldWords: Record<string, string>): string {
  const fields = Object.values(problemFieldSentences(error, fieldWords));
  return fields.length ? fields.join(' ') : problemMessage(error);
}
