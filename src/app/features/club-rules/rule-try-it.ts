import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import {
  AGE_GROUPS,
  LEVELS,
  type AgeGroup,
  type Level,
  type PlanRequest,
  type TeamDto,
} from '../../../../shared/types';
import { TeamsApi } from '../../core/api/teams-api';
import { problemMessage } from '../../core/http/problem-message';
import { ICONS } from '../../core/icons/shipped-icon';
import { PlansApi } from '../../core/api/plans-api';
import {
  outlineChanges,
  outlinePlan,
  runPlan,
  sampleSquads,
  teamSquad,
  type PlanOutline,
  type SampleSquad,
} from '../../core/engine/engine-adapter';
import { SizeInUnitsPipe } from '../../shared/pipes/size-in-units';
import { UnitChoice } from '../../core/units/unit-choice';
import { AgeGroupLabelPipe } from '../../shared/pipes/age-group-label';
import { LEVEL_LABELS } from '../../core/labels/plan-labels';

/** One situation run under both rule sets. */
export interface TryItResult {
  id: string;
  label: string;
  now: PlanOutline | { error: string };
  draft: PlanOutline | { error: string };
  changed: number;
}

const isOutline = (value: PlanOutline | { error: string }): value is PlanOutline => !('error' in value);

/** The rows of a result, in the order the engine's outline lists them. */
const OUTLINE_ROWS: { key: keyof PlanOutline; label: string }[] = [
  { key: 'groups', label: $localize`:A row comparing two plans:Groups` },
  { key: 'areas', label: $localize`:A row comparing two plans:Areas` },
  { key: 'timing', label: $localize`:A row comparing two plans:Timing` },
  { key: 'warnings', label: $localize`:A row comparing two plans:Warnings` },
];

/**
 * "Try it": the draft against one of the club's teams as it usually trains, sample squads of that
 * team's age and level, and the club's recent plans, beside the rules in use. A club without teams
 * gets the sample squads of a U10 intermediate side.
 */
@Component({
  selector: 'cw-rule-try-it',
  imports: [AgeGroupLabelPipe, MatButtonModule, ...ICONS, SizeInUnitsPipe],
  templateUrl: './rule-try-it.html',
  styleUrl: './rule-try-it.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RuleTryIt {
  private readonly plansApi = inject(PlansApi);
  private readonly teamsApi = inject(TeamsApi);
  /** The reader's units: the runs are metric, what they show is put into these. */
  protected readonly units = inject(UnitChoice);

  /** The rules being edited. */
  readonly draftBody = input.required<unknown>();
  /** The rules coaches use now (null: the starting rules). */
  readonly publishedBody = input<unknown>(null);

  protected readonly ageGroups = AGE_GROUPS;
  protected readonly levels = LEVELS;
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly rows = OUTLINE_ROWS;
  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly teamId = signal('');
  protected readonly team = computed(() => this.teams().find((team) => team.id === this.teamId()) ?? null);
  /** Until a team is chosen, and for a club with none: a U10 intermediate side. */
  protected readonly ageGroup = signal<AgeGroup>('U10');
  protected readonly level = signal<Level>('intermediate');
  protected readonly running = signal(false);
  protected readonly results = signal<TryItResult[]>([]);
  protected readonly error = signal<string | null>(null);
  protected readonly isOutline = isOutline;

  constructor() {
    this.teamsApi
      .list()
      .pipe(takeUntilDestroyed())
      .subscribe({
        next: (teams) => {
          this.teams.set(teams);
          if (teams.length) this.chooseTeam(teams[0].id);
        },
        // Without the club's teams the sample squads still work.
        error: () => undefined,
      });
  }

  protected async run(): Promise<void> {
    this.running.set(true);
    this.error.set(null);
    try {
      const [own, recent] = await Promise.all([this.teamCases(), this.recentCases()]);
      const cases = [...own, ...sampleSquads(this.ageGroup(), this.level()), ...recent];
      const results: TryItResult[] = [];
      for (const item of cases) {
        // Compared as the head of coaching reads them: sizes and warnings in their units.
        const [now, draft] = this.units.deep(
          await Promise.all([
            this.outline(item.request, this.publishedBody()),
            this.outline(item.request, this.draftBody()),
          ]),
        );
        const changed = isOutline(now) && isOutline(draft) ? outlineChanges(now, draft).length : 1;
        results.push({ id: item.id, label: this.units.text(item.label), now, draft, changed });
      }
      this.results.set(results);
    } catch (error) {
      this.error.set(error instanceof Error ? error.message : problemMessage(error));
    } finally {
      this.running.set(false);
    }
  }

  protected differs(result: TryItResult, key: keyof PlanOutline): boolean {
    return (
      isOutline(result.now) &&
      isOutline(result.draft) &&
      outlineChanges(result.now, result.draft).includes(key)
    );
  }

  protected cell(outline: PlanOutline | { error: string }, key: keyof PlanOutline): string {
    return isOutline(outline) ? outline[key] : '';
  }

  protected pickTeam(event: Event): void {
    this.chooseTeam((event.target as HTMLSelectElement).value);
  }

  protected setAge(event: Event): void {
    this.ageGroup.set((event.target as HTMLSelectElement).value as AgeGroup);
  }

  protected setLevel(event: Event): void {
    this.level.set((event.target as HTMLSelectElement).value as Level);
  }

  /** A team's age group and level become the sample squads' too; they stay editable. */
  private chooseTeam(id: string): void {
    this.teamId.set(id);
    const team = this.team();
    if (!team) return;
    this.ageGroup.set(team.ageGroup);
    this.level.set(team.level);
  }

  /** The chosen team with its current kit bag, read when the run starts so a change made since counts. */
  private async teamCases(): Promise<SampleSquad[]> {
    const team = this.team();
    if (!team) return [];
    try {
      const squad = teamSquad(team, await firstValueFrom(this.teamsApi.kit(team.id)));
      return squad ? [squad] : [];
    } catch (error) {
      // The sample squads still run; say why the team is missing from them.
      this.error.set(
        $localize`:Then the server's reason:${team.name}:team: was left out because its kit bag could not be read. ${problemMessage(error)}:reason:`,
      );
      return [];
    }
  }

  private async outline(request: PlanRequest, ruleSet: unknown): Promise<PlanOutline | { error: string }> {
    try {
      return outlinePlan(await runPlan(request, ruleSet));
    } catch (error) {
      return { error: error instanceof Error ? error.message : $localize`The engine could not make a plan.` };
    }
  }

  /** The club's three latest plans, replayed with their own players, kit, space and seed. */
  private async recentCases(): Promise<{ id: string; label: string; request: PlanRequest }[]> {
    try {
      const summaries = (await firstValueFrom(this.plansApi.list({ page: 1 }))).items.slice(0, 3);
      const plans = await Promise.all(summaries.map((s) => firstValueFrom(this.plansApi.get(s.id))));
      return plans.map((plan) => ({
        id: plan.id,
        label: $localize`:A recent plan tried again, e.g. Harbour Herons U9, 2026-11-28 (12 players):${plan.teamName}:team:, ${plan.date ?? plan.createdAt.slice(0, 10)}:date: (${plan.playerCount}:count: players)`,
        request: { ...plan.request, seed: plan.seed },
      }));
    } catch {
      return [];
    }
  }
}
