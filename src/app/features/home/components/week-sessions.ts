import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import type { ScheduledSessionDto } from '../../../../../shared/types';
import { ScheduleApi } from '../../../core/api/schedule-api';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';
import { SCHEDULE_KIND_LABELS, sessionDay } from '../../../core/labels/schedule-labels';
import { timeWords } from '../../../core/locale/locale-format';

/** The next seven days' training nights and matches of the member's teams, each with its plan or "Plan it". */
@Component({
  selector: 'cw-week-sessions',
  imports: [RouterLink, MatButtonModule, ...ICONS],
  template: `
    <section class="cw-week-sessions" aria-labelledby="next-days">
      <h2 id="next-days" i18n>Next 7 days</h2>
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
      @if (loaded() && sessions().length === 0 && !error()) {
        <p class="cw-muted" data-testid="week-empty" i18n>
          Nothing on the schedule for the next 7 days. Training nights and matches added on a team's page show
          here.
        </p>
      }
      <ol class="cw-list" data-testid="week-sessions">
        @for (s of sessions(); track s.id) {
          <li class="cw-session" [class.cw-planned]="!!s.planId">
            <div class="cw-what">
              <span class="cw-when">{{ day(s.date) }} · {{ time(s.startTime) }}</span>
              <span class="cw-title">{{ s.teamName }}: {{ kindLabels[s.kind] }}</span>
              <span class="cw-muted">
                <ng-container i18n="How many minutes Conewise plans for the session">{s.kind, select,
                  match {{{ s.minutes }} min warm-up}
                  other {{{ s.minutes }} min}
                }</ng-container
                >{{ s.place ? ' · ' + s.place : '' }}
              </span>
            </div>
            @if (s.planId) {
              <a mat-stroked-button class="cw-go" [routerLink]="['/plans', s.planId]" data-testid="open-plan">
                <mat-icon svgIcon="task_alt" aria-hidden="true" />
                <ng-container i18n="Link to the plan made for this session">See the plan</ng-container>
              </a>
            } @else if (canPlan()) {
              <a
                mat-flat-button
                class="cw-go"
                routerLink="/plan/new"
                [queryParams]="{ session: s.id }"
                data-testid="plan-it"
                i18n="Link that makes a plan for this session"
              >
                Plan it
              </a>
            } @else {
              <span class="cw-muted cw-go" i18n>Not planned yet</span>
            }
          </li>
        }
      </ol>
    </section>
  `,
  styles: `
    h2 {
      margin: 0 0 8px;
      font-size: 1.25rem;
    }
    .cw-week-sessions {
      margin-bottom: 24px;
    }
    .cw-list {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 8px;
    }
    .cw-session {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      gap: 8px 12px;
      padding: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-left: 6px solid var(--cw-cone);
      border-radius: 12px;
      background: var(--mat-sys-surface);
    }
    .cw-session.cw-planned {
      border-left-color: var(--cw-pitch);
    }
    .cw-what {
      display: flex;
      flex-direction: column;
      flex: 1 1 200px;
      min-width: 0;
    }
    .cw-when {
      font-weight: 700;
      color: var(--mat-sys-primary);
    }
    .cw-title {
      font-weight: 500;
    }
    .cw-go {
      min-height: 48px;
      margin-left: auto;
    }
    @media (max-width: 480px) {
      .cw-go {
        flex: 1 1 100%;
      }
      span.cw-go {
        min-height: 0;
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WeekSessions {
  private readonly api = inject(ScheduleApi);

  /** Whether the member makes plans (lead and coaches); assistants see what is planned. */
  readonly canPlan = input(false);

  protected readonly sessions = signal<ScheduledSessionDto[]>([]);
  protected readonly loaded = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly kindLabels = SCHEDULE_KIND_LABELS;
  protected readonly day = sessionDay;
  protected readonly time = timeWords;

  constructor() {
    this.api.upcoming(7).subscribe({
      next: (sessions) => {
        this.sessions.set(sessions);
        this.loaded.set(true);
      },
      error: (error: unknown) => {
        this.error.set(problemMessage(error));
        this.loaded.set(true);
      },
    });
  }
}
