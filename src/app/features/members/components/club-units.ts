import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import type { Units } from '../../../../../shared/units';
import { AuthApi } from '../../../core/api/auth-api';
import { ClubUnitsApi } from '../../../core/api/club-units-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { problemMessage } from '../../../core/http/problem-message';
import { FOLLOW_CLUB, UnitFields, unitProblem, type UnitPick } from '../../../shared/components/unit-fields';

const FIELD_WORDS: Record<string, string> = {
  distance: $localize`Distances`,
  temperature: $localize`Temperatures`,
};

/**
 * The club's units, on the head of coaching's club page: what everyone in the club reads and
 * types unless they choose their own on their account page. Saved at once.
 */
@Component({
  selector: 'cw-club-units',
  imports: [MatCardModule, UnitFields],
  template: `
    <mat-card appearance="outlined" class="cw-club-units">
      <mat-card-header
        ><h2 mat-card-title i18n="Heading: the units of measure the club uses">
          Club units
        </h2></mat-card-header
      >
      <mat-card-content>
        <p class="cw-muted" i18n>
          What everyone in the club reads and types for distances and temperatures: the plan wizard, plans,
          pitch-side, the printed card and e-mails. Anyone can choose their own on their account page. Plans
          are the same whatever you choose.
        </p>
        @if (units(); as current) {
          <cw-unit-fields
            [distance]="current.distance"
            [temperature]="current.temperature"
            [disabled]="saving()"
            testIdPrefix="club"
            (picked)="save($event)"
          />
        }
        <div aria-live="polite">
          @if (saved()) {
            <p role="status" class="cw-muted" data-testid="club-units-saved" i18n>Saved for the club.</p>
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
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubUnits {
  private readonly api = inject(ClubUnitsApi);
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);

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
  protected save(pick: UnitPick): void {
    // The club's own setting offers no "as the club" choice.
    if (this.saving() || pick.unit === FOLLOW_CLUB) return;
    this.saving.set(true);
    this.saved.set(false);
    this.error.set(null);
    const change: Partial<Units> =
      pick.quantity === 'distance' ? { distance: pick.unit } : { temperature: pick.unit };
    this.api.set(change).subscribe({
      next: (units) => {
        this.units.set(units);
        this.saving.set(false);
        this.saved.set(true);
        this.authApi.me().subscribe({ next: (user) => this.auth.updateUser(user) });
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(unitProblem(error, FIELD_WORDS));
      },
    });
  }
}
