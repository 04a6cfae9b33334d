import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-club-rules-page',
  template: '<section class="cw-page"><h1>Club rules</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ClubRulesPage {}
