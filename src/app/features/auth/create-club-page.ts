import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-create-club-page',
  template: '<section class="cw-page"><h1>Create a club</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CreateClubPage {}
