import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatExpansionModule } from '@angular/material/expansion';
import type { Plan } from '../../../../../shared/types';

/** Why the plan looks the way it does: the club rules that fired and what each changed. */
@Component({
  selector: 'cw-why-panel',
  imports: [MatExpansionModule],
  template: `
    <mat-expansion-panel>
      <mat-expansion-panel-header>
        <mat-panel-title><h2>Why this plan</h2></mat-panel-title>
        <mat-panel-description>{{ fired().length }} club rules applied</mat-panel-description>
      </mat-expansion-panel-header>
      <p class="cw-muted">
        Rule set {{ plan().ruleSet.id }}, version {{ plan().ruleSet.version }} · seed {{ plan().seed }}
      </p>
      <ul class="cw-trace">
        @for (entry of fired(); track entry.ruleId + $index) {
          <li>
            <strong>{{ entry.description ?? entry.ruleId }}</strong>
            @if (entry.effect) {
              <span> — {{ entry.effect }}</span>
            }
          </li>
        }
      </ul>
      @if (skipped().length) {
        <details>
          <summary>{{ skipped().length }} rules checked that did not apply</summary>
          <ul class="cw-trace">
            @for (entry of skipped(); track entry.ruleId + $index) {
              <li>{{ entry.description ?? entry.ruleId }}</li>
            }
          </ul>
        </details>
      }
      @if (plan().estimateNote) {
        <p class="cw-muted">{{ plan().estimateNote }}</p>
      }
    </mat-expansion-panel>
  `,
  styles: `
    h2 {
      margin: 0;
      font-size: 1.1rem;
    }
    .cw-trace {
      padding-left: 20px;
      margin: 6px 0;
    }
    .cw-trace li {
      margin: 4px 0;
    }
    summary {
      cursor: pointer;
      min-height: 32px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WhyPanel {
  readonly plan = input.required<Plan>();
  protected readonly fired = computed(() => this.plan().trace.filter((t) => t.fired));
  protected readonly skipped = computed(() => this.plan().trace.filter((t) => !t.fired));
}
