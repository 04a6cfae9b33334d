import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-home-page',
  template: '<section class="cw-page"><h1>This week</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {}
