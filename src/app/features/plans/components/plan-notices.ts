import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { NgTemplateOutlet } from '@angular/common';
import type { Notice, Supervision } from '../../../../../shared/types';
import { ICONS } from '../../../core/icons/shipped-icon';

/** Warnings about the adults on the pitch: shown first, with the guidance they come from. */
const SUPERVISION_CODES = new Set(['supervision-ratio', 'no-adult', 'stations-per-adult']);

/**
 * Adults and supervision, cautions (safety) and warnings (shortfalls, adaptations), at the top
 * where no one misses them; each with the source it rests on where there is one.
 */
@Component({
  selector: 'cw-plan-notices',
  imports: [...ICONS, NgTemplateOutlet],
  template: `
    <ng-template #list let-notices>
      <ul>
        @for (notice of notices; track notice.code + $index) {
          <li>
            {{ notice.message }}
            @if (notice.source) {
              <span class="cw-source" i18n="The guidance a notice rests on">Source: {{ notice.source }}</span>
            }
          </li>
        }
      </ul>
    </ng-template>
    <ng-template #ratio>
      @if (supervision(); as s) {
        @if (s.recommendedAdults) {
          <p class="cw-ratio" i18n="Children and adults at the session against the usual ratio, e.g. 1:8">
            {{ s.children }} players · {s.adults, plural, =1 {1 adult} other {{{ s.adults }} adults}} here ·
            usual guidance {{ s.ratio }}, so {{ s.recommendedAdults }} adults
          </p>
        }
      }
    </ng-template>
    @if (folded()) {
      @if (safety().length || adultWarnings().length || otherWarnings().length) {
        <details class="cw-notices cw-folded" data-testid="notices-folded">
          <summary>
            @if (safety()[0]; as first) {
              <span class="cw-line cw-safety-line" data-testid="safety-line">
                <mat-icon svgIcon="health_and_safety" aria-hidden="true" />
                <span class="cw-clip"
                  ><strong i18n="Before the first safety notice">Safety:</strong> {{ first.message }}</span
                >
              </span>
            }
            @if (toCheck().length) {
              <span class="cw-line">
                <mat-icon svgIcon="warning" aria-hidden="true" />
                <span class="cw-clip"
                  ><strong i18n="How many warnings to check, before the first of them"
                    >{{ toCheck().length }} to check:</strong
                  >
                  {{ toCheck()[0].message }}</span
                >
              </span>
            }
            <span class="cw-more">
              <mat-icon svgIcon="keyboard_arrow_down" aria-hidden="true" class="cw-more-icon" />
              <span class="cw-when-closed" i18n="Unfolds the notices: one, or all of them">{total(), plural,
                =1 {Read it in full}
                other {Read all {{ total() }}}
              }</span>
              <span class="cw-when-open" i18n="Folds the notices away again">Fold away</span>
            </span>
          </summary>
          @if (adultWarnings().length) {
            <h2 data-testid="supervision">
              <mat-icon svgIcon="groups" aria-hidden="true" />
              <ng-container i18n="Heading of the warnings about supervision"
                >Adults on the pitch</ng-container
              >
            </h2>
            <ng-container *ngTemplateOutlet="ratio" />
            <ng-container *ngTemplateOutlet="list; context: { $implicit: adultWarnings() }" />
          }
          @if (safety().length) {
            <h2 data-testid="cautions">
              <mat-icon svgIcon="health_and_safety" aria-hidden="true" />
              <ng-container i18n="Heading of the safety cautions">Safety</ng-container>
            </h2>
            <ng-container *ngTemplateOutlet="list; context: { $implicit: safety() }" />
          }
          @if (otherWarnings().length) {
            <h2 data-testid="warnings">
              <mat-icon svgIcon="warning" aria-hidden="true" />
              <ng-container i18n="Heading of the other warnings">Check before you start</ng-container>
            </h2>
            <ng-container *ngTemplateOutlet="list; context: { $implicit: otherWarnings() }" />
          }
        </details>
      }
    } @else {
      @if (adultWarnings().length) {
        <section
          class="cw-notices cw-adults"
          role="alert"
          aria-labelledby="adults-heading"
          data-testid="supervision"
        >
          <h2 id="adults-heading">
            <mat-icon svgIcon="groups" aria-hidden="true" />
            <ng-container i18n="Heading of the warnings about supervision">Adults on the pitch</ng-container>
          </h2>
          <ng-container *ngTemplateOutlet="ratio" />
          <ng-container *ngTemplateOutlet="list; context: { $implicit: adultWarnings() }" />
        </section>
      }
      @if (safety().length) {
        <section class="cw-notices cw-cautions" aria-labelledby="cautions-heading" data-testid="cautions">
          <h2 id="cautions-heading">
            <mat-icon svgIcon="health_and_safety" aria-hidden="true" />
            <ng-container i18n="Heading of the safety cautions">Safety</ng-container>
          </h2>
          <ng-container *ngTemplateOutlet="list; context: { $implicit: safety() }" />
        </section>
      }
      @if (otherWarnings().length) {
        <section class="cw-notices cw-warnings" aria-labelledby="warnings-heading" data-testid="warnings">
          <h2 id="warnings-heading">
            <mat-icon svgIcon="warning" aria-hidden="true" />
            <ng-container i18n="Heading of the other warnings">Check before you start</ng-container>
          </h2>
          <ng-container *ngTemplateOutlet="list; context: { $implicit: otherWarnings() }" />
        </section>
      }
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
    /* Phones: one folded box; its summary keeps the first safety line and the count in view. */
    .cw-folded {
      background: var(--cw-warning-bg);
      color: var(--cw-warning-fg);
      border-color: #c2410c;
      padding: 8px 12px;
    }
    .cw-folded summary {
      display: grid;
      gap: 4px;
      cursor: pointer;
      list-style: none;
    }
    .cw-folded summary::-webkit-details-marker {
      display: none;
    }
    .cw-line {
      display: flex;
      align-items: center;
      gap: 6px;
      min-width: 0;
    }
    .cw-line mat-icon {
      flex: none;
    }
    .cw-safety-line {
      color: var(--cw-caution-fg);
    }
    .cw-clip {
      overflow: hidden;
      white-space: nowrap;
      text-overflow: ellipsis;
      min-width: 0;
    }
    .cw-more {
      display: flex;
      align-items: center;
      gap: 4px;
      min-height: 32px;
      font-weight: 600;
      text-decoration: underline;
    }
    .cw-folded[open] .cw-more-icon {
      transform: rotate(180deg);
    }
    .cw-folded[open] .cw-when-closed,
    .cw-folded:not([open]) .cw-when-open {
      display: none;
    }
    .cw-folded h2 {
      margin-top: 10px;
      font-size: 1rem;
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
  /** Phones: one box folded to the first safety line and a count, the rest behind a tap. */
  readonly folded = input(false);

  /** Each message once: a caution repeated as a warning, or a warning given twice, shows once. */
  private readonly distinctWarnings = computed(() => {
    const seen = new Set(this.cautions().map((c) => c.message));
    return this.warnings().filter((w) => !seen.has(w.message) && seen.add(w.message));
  });
  protected readonly adultWarnings = computed(() =>
    this.distinctWarnings().filter((w) => SUPERVISION_CODES.has(w.code)),
  );
  protected readonly otherWarnings = computed(() =>
    this.distinctWarnings().filter((w) => !SUPERVISION_CODES.has(w.code)),
  );
  /** The cautions, each message once. */
  protected readonly safety = computed(() => distinct(this.cautions()));
  /** What the folded box counts "to check": adults first, then the rest. */
  protected readonly toCheck = computed(() => [...this.adultWarnings(), ...this.otherWarnings()]);
  protected readonly total = computed(() => this.safety().length + this.toCheck().length);
}

function distinct(notices: Notice[]): Notice[] {
  const seen = new Set<string>();
  return notices.filter((n) => !seen.has(n.message) && seen.add(n.message));
}
