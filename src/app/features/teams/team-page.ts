import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-team-page',
  template: '<section class="cw-page"><h1>Team</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamPage {}
