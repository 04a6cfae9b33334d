import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { NgTemplateOutlet } from '@angular/common';
import { MatIconModule } from '@angular/material/icon';
import type { Notice, Supervision } from '../../../../../shared/types';

/** Warnings about the adults on the pitch: shown first, with the guidance they come from. */
const SUPERVISION_CODES = new Set(['supervision-ratio', 'no-adult', 'stations-per-adult']);

/**
 * Adults and supervision, cautions (safety) and warnings (shortfalls, adaptations), at the top
 * where no one misses them; each with the source it rests on where there is one.
 */
@Component({
  selector: 'cw-plan-notices',
  imports: [MatIconModule, NgTemplateOutlet],
  template: `
    <ng-template #list let-notices>
      <ul>
        @for (notice of notices; track notice.code + $index) {
          <li>
            {{ notice.message }}
            @if (notice.source) {
              <span class="cw-source">Source: {{ notice.source }}</span>
            }
          </li>
        }
      </ul>
    </ng-template>
    @if (adultWarnings().length) {
      <section
        class="cw-notices cw-adults"
        role="alert"
        aria-labelledby="adults-heading"
        data-testid="supervision"
      >
        <h2 id="adults-heading"><mat-icon aria-hidden="true">groups</mat-icon> Adults on the pitch</h2>
        @if (supervision(); as s) {
          @if (s.recommendedAdults) {
            <p class="cw-ratio">
              {{ s.children }} players · {{ s.adults }} adult{{ s.adults === 1 ? '' : 's' }} here · usual
              guidance {{ s.ratio }}, so {{ s.recommendedAdults }} adults
            </p>
          }
        }
        <ng-container *ngTemplateOutlet="list; context: { $implicit: adultWarnings() }" />
      </section>
    }
    @if (cautions().length) {
      <section class="cw-notices cw-cautions" aria-labelledby="cautions-heading" data-testid="cautions">
        <h2 id="cautions-heading"><mat-icon aria-hidden="true">health_and_safety</mat-icon> Safety</h2>
        <ng-container *ngTemplateOutlet="list; context: { $implicit: cautions() }" />
      </section>
    }
    @if (otherWarnings().length) {
      <section class="cw-notices cw-warnings" aria-labelledby="warnings-heading" data-testid="warnings">
        <h2 id="warnings-heading"><mat-icon aria-hidden="true">warning</mat-icon> Check before you start</h2>
        <ng-container *ngTemplateOutlet="list; context: { $implicit: otherWarnings() }" />
      </section>
    }
  `,
  styles: `
    :host {
      display: grid;
      gap: 10px;
      margin-bottom: 16px;
    }
    .cw-notices {
      border-radius: 14px;
      padding: 10px 14px;
      border-left: 8px solid;
    }
    .cw-cautions {
      background: var(--cw-caution-bg);
      color: var(--cw-caution-fg);
      border-color: #c2410c;
    }
    .cw-adults {
      background: var(--cw-caution-bg);
      color: var(--cw-caution-fg);
      border-color: #9f1239;
      border-width: 1px 1px 1px 8px;
    }
    .cw-ratio {
      margin: 0 0 4px;
      font-weight: 600;
    }
    .cw-warnings {
      background: var(--cw-warning-bg);
      color: var(--cw-warning-fg);
      border-color: #d79100;
    }
    h2 {
      display: flex;
      align-items: center;
      gap: 6px;
      margin: 0 0 4px;
      font-size: 1.1rem;
    }
    ul {
      margin: 0;
      padding-left: 20px;
    }
    li {
      margin: 2px 0;
    }
    .cw-source {
      display: block;
      font-size: 0.85rem;
      opacity: 0.85;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanNotices {
  /** The plan's warnings; those about adults and supervision are shown on their own, first. */
  readonly warnings = input<Notice[]>([]);
  /** The plan's safety cautions. */
  readonly cautions = input<Notice[]>([]);
  /** Children and adults against the usual ratio, shown beside the supervision warnings. */
  readonly supervision = input<Supervision | null>(null);

  protected readonly adultWarnings = computed(() =>
    this.warnings().filter((w) => SUPERVISION_CODES.has(w.code)),
  );
  protected readonly otherWarnings = computed(() =>
    this.warnings().filter((w) => !SUPERVISION_CODES.has(w.code)),
  );
}
