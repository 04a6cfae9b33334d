import { ChangeDetectionStrategy, Component } from '@angular/core';

/** Placeholder until the screen is built. */
@Component({
  selector: 'cw-pitch-side-page',
  template: '<section class="cw-page"><h1>Pitch-side</h1></section>',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PitchSidePage {}
