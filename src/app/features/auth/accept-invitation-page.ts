import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-accept-invitation-page',
  template: '<section class="cw-page"><h1>Join your club</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationPage {}
