import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { MatExpansionModule } from '@angular/material/expansion';
import type { Plan, TraceEntry } from '../../../../../shared/types';
import type { RuleSetSummaryDto } from '../../../../../shared/types/rule-set-api';
import { rulesInWords } from '../../../../../shared/types/rule-words';
import { RuleSetsApi } from '../../../core/api/rule-sets-api';

/** Steps the planner takes by itself (timing, keepers, edits), as against the club's own rules. */
export function isPlannerStep(entry: TraceEntry): boolean {
  return /^(replan:)?(engine|edit)\./.test(entry.ruleId);
}

/** "No club rules applied", "1 club rule applied", "3 club rules applied". */
function clubRulesWords(n: number): string {
  if (n === 0) return $localize`:How many club rules changed the plan:No club rules applied`;
  return n === 1
    ? $localize`:How many club rules changed the plan:1 club rule applied`
    : $localize`:How many club rules changed the plan:${n}:count: club rules applied`;
}

/** "no planner steps", "1 planner step", "3 planner steps" (after the club rules' count). */
function plannerStepsWords(n: number): string {
  if (n === 0)
    return $localize`:How many steps the planner took by itself, after the club rules' count:no planner steps`;
  return n === 1
    ? $localize`:How many steps the planner took by itself, after the club rules' count:1 planner step`
    : $localize`:How many steps the planner took by itself, after the club rules' count:${n}:count: planner steps`;
}

/**
 * Why the plan looks the way it does: in sentences, what each club rule did, then the planner's
 * own steps, counted apart. Codes, the rule set's version and the plan reference (its seed) wait in
 * a "Details" fold for whoever needs to reproduce the plan.
 */
@Component({
  selector: 'cw-why-panel',
  imports: [MatExpansionModule],
  template: `
    <mat-expansion-panel (opened)="loadRules()">
      <mat-expansion-panel-header>
        <mat-panel-title
          ><h2 i18n="Heading of the panel that explains the plan">Why this plan</h2></mat-panel-title
        >
        <mat-panel-description data-testid="why-count">{{ countWords() }}</mat-panel-description>
      </mat-expansion-panel-header>
      <p class="cw-muted" data-testid="why-rules">{{ rulesLine() }}</p>
      <h3 i18n>What the club’s rules did</h3>
      @if (clubRules().length) {
        <ul class="cw-trace" data-testid="why-club-rules">
          @for (entry of clubRules(); track entry.ruleId + $index) {
            <li>
              <strong>{{ entry.description ?? aClubRule }}</strong>
              @if (entry.effect) {
                <span> — {{ entry.effect }}</span>
              }
            </li>
          }
        </ul>
      } @else {
        <p i18n>None of the club’s rules changed this plan.</p>
      }
      @if (plannerSteps().length) {
        <h3 i18n>How the planner fitted the session</h3>
        <ul class="cw-trace" data-testid="why-planner">
          @for (entry of plannerSteps(); track entry.ruleId + $index) {
            <li>{{ entry.effect ?? entry.description }}</li>
          }
        </ul>
      }
      @if (plan().estimateNote) {
        <p class="cw-muted">{{ plan().estimateNote }}</p>
      }
      <details data-testid="why-details">
        <summary i18n="Fold with the rule codes, version and plan reference">Details</summary>
        <p
          class="cw-muted"
          i18n="The rule set's id and version and the plan's reference, which together reproduce the plan"
        >
          Rules {{ plan().ruleSet.id }}, version {{ plan().ruleSet.version }} · plan ref {{ plan().seed }}
          (the same request, rules and plan ref make the same plan)
        </p>
        <ul class="cw-trace">
          @for (entry of plan().trace; track entry.ruleId + $index) {
            <li>
              <code>{{ entry.ruleId }}</code> {{ firedWords(entry) }}
            </li>
          }
        </ul>
      </details>
    </mat-expansion-panel>
  `,
  styles: `
    h2 {
      margin: 0;
      font-size: 1.1rem;
    }
    h3 {
      margin: 12px 0 4px;
      font-size: 1rem;
    }
    .cw-trace {
      padding-left: 20px;
      margin: 6px 0;
    }
    .cw-trace li {
      margin: 4px 0;
    }
    code {
      overflow-wrap: anywhere;
    }
    summary {
      cursor: pointer;
      min-height: 32px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WhyPanel {
  private readonly ruleSetsApi = inject(RuleSetsApi);

  readonly plan = input.required<Plan>();
  protected readonly clubRules = computed(() =>
    this.plan().trace.filter((t) => t.fired && !isPlannerStep(t)),
  );
  protected readonly plannerSteps = computed(() =>
    this.plan().trace.filter((t) => t.fired && isPlannerStep(t)),
  );
  protected readonly countWords = computed(
    () => `${clubRulesWords(this.clubRules().length)} · ${plannerStepsWords(this.plannerSteps().length)}`,
  );
  /** A club rule the trace gives no description. */
  protected readonly aClubRule = $localize`:A club rule the plan's trace does not describe:A club rule`;
  private readonly rules = signal<RuleSetSummaryDto | null>(null);
  protected readonly rulesLine = computed(() => rulesInWords(this.rules()));
  private asked: string | null = null;

  /** Whether a rule in the details applied or was only checked. */
  protected firedWords(entry: TraceEntry): string {
    return entry.fired
      ? $localize`:A rule code in the details, then whether it applied:applied`
      : $localize`:A rule code in the details, then whether it applied:checked, did not apply`;
  }

  /** The rules' name and publishing date, read when the panel is first opened. */
  protected loadRules(): void {
    const id = this.plan().ruleSet.id;
    if (this.asked === id) return;
    this.asked = id;
    this.ruleSetsApi.summary(id).subscribe({
      next: (summary) => this.rules.set(summary),
      // Offline or gone: the line says "Club rules" and the details keep the rest.
      error: () => this.rules.set(null),
    });
  }
}
