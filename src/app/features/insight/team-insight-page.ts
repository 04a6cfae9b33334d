import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { RouterLink } from '@angular/router';
import type { ChartConfiguration } from 'chart.js';
import { MatButtonModule } from '@angular/material/button';
import type { TeamDto } from '../../../../shared/types';
import type { TeamInsightDto } from '../../../../shared/types/plan-api';
import { TeamsApi } from '../../core/api/teams-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { dayWords, momentDayWords, numberWords } from '../../core/locale/locale-format';
import { InsightChart } from './insight-chart';
import { LOW_TOUCH_SHARE, summariseInsight } from './services/insight-summary';

const PITCH = '#2f7d4f';
const CONE = '#d9631c';

/** Who comes and who gets the ball: a team's attendance and estimated touches over its sessions. */
@Component({
  selector: 'cw-team-insight-page',
  imports: [RouterLink, MatButtonModule, ...ICONS, InsightChart],
  templateUrl: './team-insight-page.html',
  styleUrl: './team-insight-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamInsightPage {
  /** The team's id, from the route. */
  readonly teamId = input.required<string>();

  private readonly teamsApi = inject(TeamsApi);
  protected readonly insight = signal<TeamInsightDto | null>(null);
  protected readonly team = signal<TeamDto | null>(null);
  protected readonly error = signal<string | null>(null);
  /** A number with the browser's separators, no decimals. */
  protected readonly number = (value: number) => numberWords(value);

  protected readonly summary = computed(() => {
    const insight = this.insight();
    return insight ? summariseInsight(insight) : null;
  });
  protected readonly lowIds = computed(
    () => new Set(this.summary()?.fewestTouches.map((p) => p.playerId) ?? []),
  );
  protected readonly playersByTouches = computed(() =>
    [...(this.insight()?.players ?? [])]
      .filter((p) => p.sessionsAttended > 0)
      .sort((a, b) => a.averageTouches - b.averageTouches),
  );

  protected readonly attendanceChart = computed<ChartConfiguration | null>(() => {
    const insight = this.insight();
    if (!insight?.sessions.length) return null;
    return {
      type: 'bar',
      data: {
        labels: insight.sessions.map((s) => this.sessionLabel(s.date, s.createdAt)),
        datasets: [
          {
            label: $localize`Players present`,
            data: insight.sessions.map((s) => s.present),
            backgroundColor: insight.sessions.map((s) => (s.recorded ? PITCH : '#9cc7ad')),
            borderRadius: 4,
          },
        ],
      },
      options: {
        scales: {
          y: {
            beginAtZero: true,
            suggestedMax: insight.squadSize,
            ticks: { precision: 0 },
            title: { display: true, text: $localize`:Chart axis title:players` },
          },
        },
        plugins: { legend: { display: false } },
      },
    };
  });

  protected readonly touchesChart = computed<ChartConfiguration | null>(() => {
    const players = this.playersByTouches();
    if (!players.length) return null;
    const low = this.lowIds();
    return {
      type: 'bar',
      data: {
        labels: players.map((p) => p.displayName),
        datasets: [
          {
            label: $localize`Estimated touches per session attended`,
            data: players.map((p) => Math.round(p.averageTouches)),
            backgroundColor: players.map((p) => (low.has(p.playerId) ? CONE : PITCH)),
            borderRadius: 4,
          },
        ],
      },
      options: {
        indexAxis: 'y',
        scales: {
          x: {
            beginAtZero: true,
            title: { display: true, text: $localize`:Chart axis title:touches (estimate)` },
          },
        },
        plugins: { legend: { display: false } },
      },
    };
  });

  protected readonly touchesHeight = computed(() => Math.max(200, this.playersByTouches().length * 28 + 60));
  protected readonly lowShare = Math.round(LOW_TOUCH_SHARE * 100);

  constructor() {
    effect(() => {
      const teamId = this.teamId();
      untracked(() => this.load(teamId));
    });
  }

  private load(teamId: string): void {
    this.error.set(null);
    this.teamsApi.insight(teamId).subscribe({
      next: (insight) => this.insight.set(insight),
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    this.teamsApi.get(teamId).subscribe({ next: (team) => this.team.set(team), error: () => undefined });
  }

  /** A chart's words for screen readers: what it is, then what it shows. */
  protected chartSummary(line: string): string {
    return $localize`Bar chart. ${line}:summary:`;
  }

  /** "1 Dec 2026" in the browser's locale: the session's day, else the day the plan was made. */
  protected sessionDay(date: string | null, createdAt: string): string {
    return date ? dayWords(date, 'day-month-year') : momentDayWords(createdAt, 'day-month-year');
  }

  /** "1 Dec" for the chart's axis, in the browser's locale. */
  private sessionLabel(date: string | null, createdAt: string): string {
    return date ? dayWords(date, 'day-month') : momentDayWords(createdAt, 'day-month');
  }
}
