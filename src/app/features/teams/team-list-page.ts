import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-team-list-page',
  template: '<section class="cw-page"><h1>Teams</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamListPage {}
