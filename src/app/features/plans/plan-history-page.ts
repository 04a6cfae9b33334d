import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-plan-history-page',
  template: '<section class="cw-page"><h1>Past plans</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanHistoryPage {}
