import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { PlanSummaryDto, TeamDto } from '../../../../shared/types';
import { PlansApi } from '../../core/api/plans-api';
import { TeamsApi } from '../../core/api/teams-api';
import { AuthStore } from '../../core/auth/auth-store';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { KIND_LABELS } from '../../core/labels/plan-labels';
import { dayWords, timeWords } from '../../core/locale/locale-format';
import { DeletePlanDialog } from './components/delete-plan-dialog';
import { planName } from './services/plan-words';
import { mediaMatches, PHONE_WIDTH_QUERY } from '../../core/layout/media-query';

/** A team's past plans, newest first, each reusable for today with today's players. */
@Component({
  selector: 'cw-plan-history-page',
  imports: [RouterLink, MatTableModule, MatPaginatorModule, MatButtonModule, ...ICONS],
  templateUrl: './plan-history-page.html',
  styleUrl: './plan-history-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanHistoryPage {
  private readonly plansApi = inject(PlansApi);
  private readonly teamsApi = inject(TeamsApi);
  private readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly teamId = input.required<string>();

  protected readonly team = signal<TeamDto | null>(null);
  protected readonly plans = signal<PlanSummaryDto[]>([]);
  protected readonly total = signal(0);
  protected readonly pageSize = signal(20);
  protected readonly pageIndex = signal(0);
  protected readonly error = signal<string | null>(null);
  protected readonly loaded = signal(false);
  protected readonly kindLabels: Record<string, string> = KIND_LABELS;
  protected readonly day = dayWords;
  protected readonly time = timeWords;
  protected readonly canPlan = computed(() => this.auth.hasRole('lead', 'coach'));
  /** On a phone the session and players fold under the date, so the row fits 390 px. */
  protected readonly compact = mediaMatches(PHONE_WIDTH_QUERY);
  protected readonly columns = computed(() => {
    const facts = this.compact() ? ['date'] : ['date', 'kind', 'players'];
    return this.canPlan() ? [...facts, 'reuse'] : facts;
  });

  constructor() {
    effect(() => {
      const id = this.teamId();
      this.teamsApi.get(id).subscribe({ next: (team) => this.team.set(team), error: () => undefined });
      this.load(id, this.pageIndex());
    });
  }

  private load(teamId: string, pageIndex: number): void {
    this.plansApi.list({ teamId, page: pageIndex + 1 }).subscribe({
      next: (page) => {
        this.plans.set(page.items);
        this.total.set(page.total);
        this.pageSize.set(page.pageSize);
        this.loaded.set(true);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected changePage(event: PageEvent): void {
    this.pageIndex.set(event.pageIndex);
  }

  /** The "Use today" link of one plan, for screen readers. */
  protected reuseLabel(plan: PlanSummaryDto): string {
    return $localize`:Link that makes today's plan from a past one, named by its day:Use the plan of ${dayWords(plan.date)}:day: again today`;
  }

  /** The delete button of one plan, for screen readers. */
  protected deleteLabel(plan: PlanSummaryDto): string {
    return $localize`:Button that deletes a past plan, named by its day:Delete the plan of ${dayWords(plan.date)}:day:`;
  }

  /** Asks, deletes, then shows the page again without the plan and says what went. */
  protected deletePlan(plan: PlanSummaryDto): void {
    this.dialog
      .open<DeletePlanDialog, PlanSummaryDto, boolean>(DeletePlanDialog, {
        data: plan,
        width: '460px',
        maxWidth: 'calc(100vw - 32px)',
      })
      .afterClosed()
      .subscribe((deleted) => {
        if (!deleted) return;
        this.snackBar.open(
          $localize`:A plan deleted, named by kind, day and team:${planName(plan)}:plan: deleted.`,
          undefined,
          { duration: 5000, politeness: 'polite' },
        );
        // The last plan of a page gone: show the page before it.
        if (this.plans().length === 1 && this.pageIndex() > 0) this.pageIndex.update((i) => i - 1);
        else this.load(this.teamId(), this.pageIndex());
      });
  }
}
