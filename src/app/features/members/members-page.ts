import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-members-page',
  template: '<section class="cw-page"><h1>Members</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MembersPage {}
