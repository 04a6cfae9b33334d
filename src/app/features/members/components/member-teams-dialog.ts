import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule, type MatCheckboxChange } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import type { MemberDto, TeamDto } from '../../../../../shared/types';
import { TeamsApi } from '../../../core/api/teams-api';
import { problemMessage } from '../../../core/http/problem-message';
import { AgeGroupLabelPipe } from '../../../shared/pipes/age-group-label';

/** The member and the club's teams, as the members page holds them. */
export interface MemberTeamsData {
  member: MemberDto;
  teams: TeamDto[];
}

/**
 * The teams one member helps with: ticking a team puts them on its staff at once, unticking takes
 * them off. The dialog keeps the teams as the server answers them; the page reads them back from
 * `teams()` when it closes.
 */
@Component({
  selector: 'cw-member-teams-dialog',
  imports: [AgeGroupLabelPipe, MatButtonModule, MatCheckboxModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title i18n>{{ data.member.name }}’s teams</h2>
    <mat-dialog-content>
      @if (teams().length === 0) {
        <p i18n>The club has no teams yet.</p>
      } @else {
        @if (data.member.role === 'coach') {
          <p class="cw-muted" i18n>They see these teams and their plans and can change them.</p>
        } @else {
          <p class="cw-muted" i18n>They see these teams and their plans.</p>
        }
        <ul class="cw-team-ticks" data-testid="member-teams">
          @for (team of teams(); track team.id) {
            <li>
              <mat-checkbox
                [checked]="team.coachIds.includes(data.member.userId)"
                [disabled]="busy() === team.id"
                (change)="setOnTeam(team, $event)"
              >
                {{ team.name }} <span class="cw-muted">({{ team.ageGroup | ageGroupLabel }})</span>
              </mat-checkbox>
            </li>
          }
        </ul>
      }
      <div aria-live="polite">
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
      </div>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-flat-button type="button" [mat-dialog-close]="teams()" i18n>Done</button>
    </mat-dialog-actions>
  `,
  styles: `
    .cw-team-ticks {
      list-style: none;
      margin: 0;
      padding: 0;
      li {
        min-height: 48px;
        display: flex;
        align-items: center;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MemberTeamsDialog {
  private readonly teamsApi = inject(TeamsApi);
  protected readonly data = inject<MemberTeamsData>(MAT_DIALOG_DATA);
  private readonly current = signal<TeamDto[]>(this.data.teams);
  /** The club's teams as the server last answered them. */
  readonly teams = computed(() => this.current());
  protected readonly busy = signal<string | null>(null);
  protected readonly error = signal<string | null>(null);

  protected setOnTeam(team: TeamDto, change: MatCheckboxChange): void {
    const on = change.checked;
    const userId = this.data.member.userId;
    this.busy.set(team.id);
    this.error.set(null);
    const call = on ? this.teamsApi.addStaff(team.id, userId) : this.teamsApi.removeStaff(team.id, userId);
    call.subscribe({
      next: (saved) => {
        this.busy.set(null);
        this.current.update((list) => list.map((t) => (t.id === saved.id ? saved : t)));
      },
      error: (error: unknown) => {
        this.busy.set(null);
        // Put the tick back to what the server still holds.
        change.source.checked = !on;
        this.error.set(problemMessage(error));
      },
    });
  }
}
