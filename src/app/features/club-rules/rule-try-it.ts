import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { AGE_GROUPS, LEVELS, type AgeGroup, type Level, type PlanRequest } from '../../../../shared/types';
import { problemMessage } from '../../core/http/problem-message';
import { OUTLINE_ROWS, outlinePlan, type PlanOutline } from './services/plan-outline';
import { runPlan } from './services/plan-runner';
import { RuleSetsApi } from './services/rule-sets-api';
import { sampleSquads } from './services/sample-squads';

/** One situation run under both rule sets. */
export interface TryItResult {
  id: string;
  label: string;
  now: PlanOutline | { error: string };
  draft: PlanOutline | { error: string };
  changed: number;
}

const isOutline = (value: PlanOutline | { error: string }): value is PlanOutline => !('error' in value);

/** "Try it": the draft against sample squads and the club's recent plans, beside the rules in use. */
@Component({
  selector: 'cw-rule-try-it',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './rule-try-it.html',
  styleUrl: './rule-try-it.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RuleTryIt {
  private readonly api = inject(RuleSetsApi);

  /** The rules being edited. */
  readonly draftBody = input.required<unknown>();
  /** The rules coaches use now (null: the starting rules). */
  readonly publishedBody = input<unknown>(null);

  protected readonly ageGroups = AGE_GROUPS;
  protected readonly levels = LEVELS;
  protected readonly rows = OUTLINE_ROWS;
  protected readonly ageGroup = signal<AgeGroup>('U10');
  protected readonly level = signal<Level>('intermediate');
  protected readonly running = signal(false);
  protected readonly results = signal<TryItResult[]>([]);
  protected readonly error = signal<string | null>(null);
  protected readonly isOutline = isOutline;

  protected async run(): Promise<void> {
    this.running.set(true);
    this.error.set(null);
    try {
      const cases: { id: string; label: string; request: PlanRequest }[] = sampleSquads(
        this.ageGroup(),
        this.level(),
      );
      cases.push(...(await this.recentCases()));
      const results: TryItResult[] = [];
      for (const item of cases) {
        const [now, draft] = await Promise.all([
          this.outline(item.request, this.publishedBody()),
          this.outline(item.request, this.draftBody()),
        ]);
        const changed =
          isOutline(now) && isOutline(draft)
            ? OUTLINE_ROWS.filter((row) => now[row.key] !== draft[row.key]).length
            : 1;
        results.push({ id: item.id, label: item.label, now, draft, changed });
      }
      this.results.set(results);
    } catch (error) {
      this.error.set(error instanceof Error ? error.message : problemMessage(error));
    } finally {
      this.running.set(false);
    }
  }

  protected differs(result: TryItResult, key: keyof PlanOutline): boolean {
    return isOutline(result.now) && isOutline(result.draft) && result.now[key] !== result.draft[key];
  }

  protected cell(outline: PlanOutline | { error: string }, key: keyof PlanOutline): string {
    return isOutline(outline) ? outline[key] : '';
  }

  protected setAge(event: Event): void {
    this.ageGroup.set((event.target as HTMLSelectElement).value as AgeGroup);
  }

  protected setLevel(event: Event): void {
    this.level.set((event.target as HTMLSelectElement).value as Level);
  }

  private async outline(request: PlanRequest, ruleSet: unknown): Promise<PlanOutline | { error: string }> {
    try {
      return outlinePlan(await runPlan(request, ruleSet));
    } catch (error) {
      return { error: error instanceof Error ? error.message : 'The engine could not make a plan.' };
    }
  }

  /** The club's three latest plans, replayed with their own players, kit, space and seed. */
  private async recentCases(): Promise<{ id: string; label: string; request: PlanRequest }[]> {
    try {
      const summaries = await firstValueFrom(this.api.recentPlans(3));
      const plans = await Promise.all(summaries.map((s) => firstValueFrom(this.api.plan(s.id))));
      return plans.map((plan) => ({
        id: plan.id,
        label: `${plan.teamName}, ${plan.date ?? plan.createdAt.slice(0, 10)} (${plan.playerCount} players)`,
        request: { ...plan.request, seed: plan.seed },
      }));
    } catch {
      return [];
    }
  }
}
