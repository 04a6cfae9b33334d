import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-team-insight-page',
  template: '<section class="cw-page"><h1>Team insight</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamInsightPage {}
