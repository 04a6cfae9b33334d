import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { Router, RouterLink } from '@angular/router';
import { AGE_GROUPS, LEVELS, type AgeGroup, type Level, type TeamDto } from '../../../../shared/types';
import { TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { applyFieldErrors, controlMessage } from '../../core/forms/form-errors';
import { checkAgainstSchema } from '../../core/forms/schema-form';
import { LEVEL_LABELS } from '../../core/labels/plan-labels';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';

/** The club's teams, and a short form to add one. */
@Component({
  selector: 'cw-team-list-page',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatCardModule,
    MatButtonModule,
    MatIconModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
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
  protected readonly canAdd = computed(() => this.auth.hasRole('lead', 'coach'));
  protected readonly ageGroups = AGE_GROUPS;
  protected readonly levels = LEVELS;
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly message = controlMessage;

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', Validators.required],
    ageGroup: ['U10' as AgeGroup, Validators.required],
    level: ['beginner' as Level, Validators.required],
    usualSpace: inject(NonNullableFormBuilder).group({
      width: [30, [Validators.required, Validators.min(5), Validators.max(130)]],
      length: [40, [Validators.required, Validators.min(5), Validators.max(130)]],
    }),
  });

  constructor() {
    this.teamsApi.list().subscribe({
      next: (teams) => {
        this.teams.set(teams);
        this.loaded.set(true);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected async addTeam(): Promise<void> {
    this.error.set(null);
    const value = this.form.getRawValue();
    const check = await checkAgainstSchema(this.form, 'team-create', value, {
      name: 'Team name',
      'usualSpace.width': 'Width',
      'usualSpace.length': 'Length',
    });
    if (!check.ok) return;
    this.teamsApi.create(value).subscribe({
      next: (team) => void this.router.navigate(['/teams', team.id]),
      error: (error: unknown) => {
        applyFieldErrors(this.form, problemFieldErrors(error));
        this.error.set(problemMessage(error));
      },
    });
  }
}
