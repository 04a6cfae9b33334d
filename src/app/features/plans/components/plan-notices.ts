import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { Notice } from '../../../../../shared/types';

/** Cautions (safety) and warnings (shortfalls, adaptations), at the top where no one misses them. */
@Component({
  selector: 'cw-plan-notices',
  imports: [MatIconModule],
  template: `
    @if (cautions().length) {
      <section class="cw-notices cw-cautions" aria-labelledby="cautions-heading" data-testid="cautions">
        <h2 id="cautions-heading"><mat-icon aria-hidden="true">health_and_safety</mat-icon> Safety</h2>
        <ul>
          @for (caution of cautions(); track caution.code + $index) {
            <li>
              {{ caution.message }}
              @if (caution.source) {
                <span class="cw-source">Source: {{ caution.source }}</span>
              }
            </li>
          }
        </ul>
      </section>
    }
    @if (warnings().length) {
      <section class="cw-notices cw-warnings" aria-labelledby="warnings-heading" data-testid="warnings">
        <h2 id="warnings-heading"><mat-icon aria-hidden="true">warning</mat-icon> Check before you start</h2>
        <ul>
          @for (warning of warnings(); track warning.code + $index) {
            <li>{{ warning.message }}</li>
          }
        </ul>
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
  readonly warnings = input<Notice[]>([]);
  readonly cautions = input<Notice[]>([]);
}
