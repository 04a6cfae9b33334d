import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { RouterLink } from '@angular/router';
import { forkJoin } from 'rxjs';
import type { PlanSummaryDto, TeamDto } from '../../../../shared/types';
import { PlansApi } from '../../core/api/plans-api';
import { TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { ICONS } from '../../core/icons/shipped-icon';
import { KIND_LABELS } from '../../core/labels/plan-labels';
import { dayWords, timeWords } from '../../core/locale/locale-format';
import { weekRange } from '../../core/time/dates';
import { problemMessage } from '../../core/http/problem-message';
import { NoTeamYet } from '../../shared/components/no-team-yet';
import { WeekSessions } from './components/week-sessions';
import { AgeGroupLabelPipe } from '../../shared/pipes/age-group-label';

interface TeamWeek {
  team: TeamDto;
  plans: PlanSummaryDto[];
}

/** This week's sessions by team, and the one thing a coach comes for: plan a warm-up. */
@Component({
  selector: 'cw-home-page',
  imports: [AgeGroupLabelPipe, RouterLink, MatButtonModule, MatCardModule, ...ICONS, NoTeamYet, WeekSessions],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  private readonly teamsApi = inject(TeamsApi);
  private readonly plansApi = inject(PlansApi);
  protected readonly auth = inject(AuthStore);

  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly plans = signal<PlanSummaryDto[]>([]);
  protected readonly loaded = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly kindLabels = KIND_LABELS;
  protected readonly day = dayWords;
  protected readonly time = timeWords;
  protected readonly canPlan = computed(() => this.auth.hasRole('lead', 'coach'));

  protected readonly weeks = computed<TeamWeek[]>(() =>
    this.teams().map((team) => ({
      team,
      plans: this.plans()
        .filter((plan) => plan.teamId === team.id)
        .sort((a, b) => `${a.date}${a.kickOff}`.localeCompare(`${b.date}${b.kickOff}`)),
    })),
  );

  constructor() {
    const { from, to } = weekRange();
    forkJoin({ teams: this.teamsApi.list(), plans: this.plansApi.list({ from, to }) }).subscribe({
      next: ({ teams, plans }) => {
        this.teams.set(teams);
        this.plans.set(plans.items);
        this.loaded.set(true);
      },
      error: (error: unknown) => {
        this.error.set(problemMessage(error));
        this.loaded.set(true);
      },
    });
  }
}
