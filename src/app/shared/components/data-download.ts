import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { DataExportApi } from '../../core/api/data-export-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';

/**
 * Downloads the club's data (no team given: the head of coaching on the Members page) or one
 * team's (its page, for the head of coaching and the team's coaches) as one ZIP, and saves it.
 */
@Component({
  selector: 'cw-data-download',
  imports: [MatButtonModule, MatCardModule, ...ICONS],
  template: `
    <mat-card appearance="outlined" class="cw-data-download">
      <mat-card-header>
        @if (forTeam()) {
          <h2 mat-card-title i18n="Heading: downloading everything kept about one team">This team’s data</h2>
        } @else {
          <h2 mat-card-title i18n="Heading: downloading everything the club keeps">The club’s data</h2>
        }
      </mat-card-header>
      <mat-card-content>
        @if (forTeam()) {
          <p class="cw-muted" i18n>
            Everything Conewise keeps about this team in one ZIP file: its players, who came to each session,
            how the stations went, its coaches and assistants, and its plans. A note inside says what each
            file is.
          </p>
        } @else {
          <p class="cw-muted" i18n>
            Everything Conewise keeps for the club in one ZIP file: teams, players, who came to each session,
            how the stations went, members, plans and the club rules with their history. A note inside says
            what each file is.
          </p>
        }
        <button
          mat-stroked-button
          type="button"
          data-testid="data-download"
          [disabled]="busy()"
          (click)="download()"
        >
          <mat-icon svgIcon="download" aria-hidden="true" />
          @if (busy()) {
            <ng-container i18n="Button, while the ZIP file of data is being made"
              >Preparing the download…</ng-container
            >
          } @else if (forTeam()) {
            <ng-container i18n>Download this team’s data</ng-container>
          } @else {
            <ng-container i18n>Download the club’s data</ng-container>
          }
        </button>
        <div aria-live="polite">
          @if (error(); as text) {
            <p class="cw-form-error" role="alert">{{ text }}</p>
          }
        </div>
      </mat-card-content>
    </mat-card>
  `,
  styles: `
    :host {
      display: block;
    }
    .cw-data-download {
      margin-top: 1.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DataDownload {
  private readonly api = inject(DataExportApi);

  /** The team whose data to download; none for the whole club. */
  readonly teamId = input<string | null>(null);

  protected readonly forTeam = computed(() => this.teamId() !== null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  /** Fetches the ZIP with the signed-in person's token and saves it under the server's name. */
  protected download(): void {
    const teamId = this.teamId();
    this.busy.set(true);
    this.error.set(null);
    (teamId === null ? this.api.club() : this.api.team(teamId)).subscribe({
      next: ({ blob, filename }) => {
        this.busy.set(false);
        const url = URL.createObjectURL(blob);
        const link = document.createElement('a');
        link.href = url;
        link.download = filename;
        link.click();
        setTimeout(() => URL.revokeObjectURL(url), 10_000);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
