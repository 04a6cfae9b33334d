import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-plan-page',
  template: '<section class="cw-page"><h1>Plan</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanPage {}
