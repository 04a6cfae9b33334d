import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-plan-wizard',
  template: '<section class="cw-page"><h1>Plan a session</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanWizard {}
