import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import type { Units } from '../../../../../shared/units';
import { AuthApi } from '../../../core/api/auth-api';
import { ClubUnitsApi } from '../../../core/api/club-units-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { InstantSave } from '../../../core/forms/instant-save';
import { SaveStatus } from '../../../shared/components/save-status';
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
  imports: [MatCardModule, SaveStatus, UnitFields],
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
        @if (setting.value(); as current) {
          <cw-unit-fields
            [distance]="current.distance"
            [temperature]="current.temperature"
            [disabled]="setting.saving()"
            testIdPrefix="club"
            (picked)="save($event)"
          />
        }
        <cw-save-status [setting]="setting" testId="club-units-saved" />
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

  protected readonly setting = new InstantSave<Units>((error) => unitProblem(error, FIELD_WORDS));

  constructor() {
    this.setting.load(this.api.get());
  }

  /** Saves one unit for the club, then reads the signed-in person again so every screen follows. */
  protected save(pick: UnitPick): void {
    // The club's own setting offers no "as the club" choice.
    if (pick.unit === FOLLOW_CLUB) return;
    const change: Partial<Units> =
      pick.quantity === 'distance' ? { distance: pick.unit } : { temperature: pick.unit };
    this.setting.save(
      () => this.api.set(change),
      () => this.authApi.me().subscribe({ next: (user) => this.auth.updateUser(user) }),
    );
  }
}
