import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { Router, RouterLink } from '@angular/router';
import type { TeamDto } from '../../../../shared/types';
import { TeamsApi, type TeamBody } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { RetryKey } from '../../core/http/retry-key';
import { ICONS } from '../../core/icons/shipped-icon';
import { LEVEL_LABELS } from '../../core/labels/plan-labels';
import { NoTeamYet } from '../../shared/components/no-team-yet';
import { TeamDefaultsForm } from './components/team-defaults-form';
import { AgeGroupLabelPipe } from '../../shared/pipes/age-group-label';

/** The club's teams, and a short form to add one. */
@Component({
  selector: 'cw-team-list-page',
  imports: [
    AgeGroupLabelPipe,
    RouterLink,
    MatCardModule,
    MatButtonModule,
    ...ICONS,
    TeamDefaultsForm,
    NoTeamYet,
  ],
  templateUrl: './team-list-page.html',
  styleUrl: './team-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamListPage {
  private readonly teamsApi = inject(TeamsApi);
  private readonly router = inject(Router);
  private readonly auth = inject(AuthStore);

  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly loaded = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly adding = signal(false);
  /** True while a new team is being created. */
  protected readonly saving = signal(false);
  private readonly teamKey = new RetryKey();
  protected readonly canAdd = computed(() => this.auth.hasRole('lead', 'coach'));
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly serverErrors = signal<Record<string, string>>({});

  constructor() {
    this.teamsApi.list().subscribe({
      next: (teams) => {
        this.teams.set(teams);
        this.loaded.set(true);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected addTeam(value: TeamBody): void {
    if (this.saving()) return;
    this.saving.set(true);
    this.error.set(null);
    this.teamsApi.create(value, this.teamKey.for(value)).subscribe({
      next: (team) => void this.router.navigate(['/teams', team.id]),
      error: (error: unknown) => {
        this.saving.set(false);
        this.serverErrors.set(problemFieldErrors(error));
        this.error.set(problemMessage(error));
      },
    });
  }
}
