import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { ClubRetentionDto } from '../../../../../shared/types/api';
import { ClubRetentionApi } from '../../../core/api/club-retention-api';
import { InstantSave } from '../../../core/forms/instant-save';
import { SaveStatus } from '../../../shared/components/save-status';

/** The choices the server accepts (shared/schemas/api/club-retention-update.schema.json). */
const SEASON_CHOICES = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

/**
 * How long the club keeps plans and attendance, on the head of coaching's club page. Older plans,
 * with their attendance and feedback, are removed for good by the server. Saved at once.
 */
@Component({
  selector: 'cw-club-retention',
  imports: [FormsModule, MatCardModule, MatFormFieldModule, MatSelectModule, RouterLink, SaveStatus],
  template: `
    <mat-card appearance="outlined" class="cw-club-retention">
      <mat-card-header
        ><h2 mat-card-title i18n="Heading: how long the club keeps plans and attendance">
          How long we keep records
        </h2></mat-card-header
      >
      <mat-card-content>
        <p class="cw-muted" i18n>
          Plans, who came to each session and how each activity went are removed for good once they are older
          than this (a season counts as 365 days). Download the club's data first if you want a copy.
          <a routerLink="/privacy">What Conewise keeps about children</a>.
        </p>
        @if (setting.value(); as current) {
          <mat-form-field appearance="outline" subscriptSizing="dynamic">
            <mat-label i18n>Keep plans and attendance for</mat-label>
            <mat-select
              [ngModel]="current.seasons"
              (ngModelChange)="save($event)"
              [disabled]="setting.saving()"
              data-testid="club-retention-seasons"
            >
              @for (choice of choices; track choice) {
                <mat-option [value]="choice" i18n>{choice, plural,
                  =1 {1 season}
                  other {{{ choice }} seasons}
                }</mat-option>
              }
            </mat-select>
          </mat-form-field>
        }
        <cw-save-status [setting]="setting" testId="club-retention-saved" />
      </mat-card-content>
    </mat-card>
  `,
  styles: `
    .cw-club-retention {
      margin-top: 1.5rem;
      mat-form-field {
        width: min(100%, 20rem);
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubRetention {
  private readonly api = inject(ClubRetentionApi);

  protected readonly choices = SEASON_CHOICES;
  protected readonly setting = new InstantSave<ClubRetentionDto>();

  constructor() {
    this.setting.load(this.api.get());
  }

  protected save(seasons: number): void {
    if (seasons === this.setting.value()?.seasons) return;
    this.setting.save(() => this.api.set(seasons));
  }
}
